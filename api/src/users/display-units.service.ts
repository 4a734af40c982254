import { Injectable } from '@nestjs/common';
import type { UnitSystem } from '@pourgate/batching';
import type { RequestContext } from '../auth/principal.js';
import { malformed } from '../common/problems.js';
import { UsersRepository } from './users.repository.js';

const SYSTEMS: readonly UnitSystem[] = ['metric', 'imperial'];

/**
 * The unit system to show figures in: `?units=` when given, else the signed-in person's
 * preference, else (API keys) the organization's. SI values always come alongside.
 */
@Injectable()
export class DisplayUnitsService {
  constructor(private readonly users: UsersRepository) {}

  async resolve(c: RequestContext, requested: unknown): Promise<UnitSystem> {
    if (requested !== undefined && requested !== '') {
      if (typeof requested !== 'string' || !SYSTEMS.includes(requested as UnitSystem)) {
        throw malformed('The "units" query parameter must be metric or imperial.', [{ pointer: '/units', detail: 'must be one of: metric, imperial', code: 'enum' }]);
      }
      return requested as UnitSystem;
    }
    if (c.principal.kind === 'user') {
      const u = await this.users.findInOrg(c.principal.organizationId, c.principal.id);
      if (u) return u.unit_system;
    }
    return (await this.users.organizationUnitSystem(c.principal.organizationId)) ?? 'metric';
  }
}
