import type { Knex } from 'knex';
import type { UnitSystem } from '@pourgate/batching';
import type { RequestContext } from '../auth/principal.js';
import { malformed } from '../common/problems.js';

const SYSTEMS: readonly UnitSystem[] = ['metric', 'imperial'];

/**
 * The unit system to show figures in: `?units=` when given, else the signed-in person's
 * preference, else (API keys) the organization's. SI values always come alongside.
 */
export async function unitSystemFor(db: Knex, c: RequestContext, requested: unknown): Promise<UnitSystem> {
  if (requested !== undefined && requested !== '') {
    if (typeof requested !== 'string' || !SYSTEMS.includes(requested as UnitSystem)) {
      throw malformed('The "units" query parameter must be metric or imperial.', [{ pointer: '/units', detail: 'must be one of: metric, imperial', code: 'enum' }]);
    }
    return requested as UnitSystem;
  }
  if (c.principal.kind === 'user') {
    const u = await db('users').where({ id: c.principal.id, organization_id: c.principal.organizationId }).first('unit_system');
    if (u) return u.unit_system;
  }
  const o = await db('organizations').where({ id: c.principal.organizationId }).first('unit_system');
  return (o?.unit_system as UnitSystem | undefined) ?? 'metric';
}
