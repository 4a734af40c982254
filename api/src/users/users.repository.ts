import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { Role } from '@pourgate/permissions';
import { KNEX } from '../database/database.module.js';

export interface UserRow {
  id: string;
  organization_id: string;
  email: string;
  name: string;
  role: Role;
  password_hash: string | null;
  disabled: boolean;
  unit_system: 'metric' | 'imperial';
  notify_rejections: 'each' | 'digest' | 'off';
  notify_drift: 'each' | 'off';
  last_sign_in_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface UserView {
  id: string;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  unitSystem: 'metric' | 'imperial';
  notifyRejections: 'each' | 'digest' | 'off';
  lastSignInAt: Date | null;
  createdAt: Date;
}

export function toUserView(u: UserRow): UserView {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    disabled: u.disabled,
    unitSystem: u.unit_system,
    notifyRejections: u.notify_rejections,
    lastSignInAt: u.last_sign_in_at,
    createdAt: u.created_at,
  };
}

@Injectable()
export class UsersRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  findById(id: string): Promise<UserRow | undefined> {
    return this.db<UserRow>('users').where({ id }).first();
  }

  findByEmail(email: string): Promise<UserRow | undefined> {
    return this.db<UserRow>('users').where({ email }).first();
  }

  findInOrg(orgId: string, id: string): Promise<UserRow | undefined> {
    return this.db<UserRow>('users').where({ id, organization_id: orgId }).first();
  }

  /** The organization's default unit system (what API keys see). */
  async organizationUnitSystem(orgId: string): Promise<'metric' | 'imperial' | undefined> {
    const o = await this.db('organizations').where({ id: orgId }).first('unit_system');
    return o?.unit_system;
  }

  countActiveAdmins(orgId: string, trx?: Knex.Transaction): Promise<number> {
    return (trx ?? this.db)('users')
      .where({ organization_id: orgId, role: 'admin', disabled: false })
      .count<{ count: number }[]>({ count: '*' })
      .then((r) => Number(r[0].count));
  }
}
