import { Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import argon2 from 'argon2';
import type { Knex } from 'knex';
import { randomBytes } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import type { Role } from '@pourgate/permissions';
import { actorOf, RequestContext } from '../auth/principal.js';
import { MeView, sha256, TokensService } from '../auth/tokens.service.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { ProblemException, validationProblem } from '../common/problems.js';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { MailService } from '../mail/mail.service.js';
import { toUserView, UserRow, UsersRepository, UserView } from './users.repository.js';

export const usersListSpec: ListSpec = {
  resource: 'users',
  sortable: ['name', 'email', 'role', 'createdAt', 'lastSignInAt'],
  filters: { q: 'text', role: 'eq', disabled: 'bool', id: 'in' },
  defaultSort: ['name', 'ASC'],
};
const userColumns = { createdAt: 'created_at', lastSignInAt: 'last_sign_in_at', q: 'name' };

export const invitationsListSpec: ListSpec = {
  resource: 'invitations',
  sortable: ['createdAt', 'email', 'expiresAt'],
  filters: { email: 'text', role: 'eq', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
const invitationColumns = { createdAt: 'invitations.created_at', expiresAt: 'invitations.expires_at', email: 'invitations.email', role: 'invitations.role', id: 'invitations.id' };

function notFound(what: string): ProblemException {
  return new ProblemException(404, { detail: `No ${what} with that id in your organization.` });
}

interface InvitationRow {
  id: string;
  email: string;
  role: Role;
  invited_by: string | null;
  inviter_name: string | null;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

function invitationView(r: InvitationRow) {
  const state = r.accepted_at ? 'accepted' : r.revoked_at ? 'revoked' : r.expires_at < new Date() ? 'expired' : 'pending';
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    invitedBy: r.invited_by ? { id: r.invited_by, name: r.inviter_name } : null,
    expiresAt: r.expires_at,
    acceptedAt: r.accepted_at,
    revokedAt: r.revoked_at,
    createdAt: r.created_at,
    state,
  };
}

/** People of an organization: profiles, roles, invitations. */
@Injectable()
export class UsersService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly users: UsersRepository,
    private readonly tokens: TokensService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly config: ConfigService<Env, true>,
  ) {}

  me(c: RequestContext): Promise<MeView> {
    return this.tokens.me(c.principal.id);
  }

  async updateMe(c: RequestContext, body: { name?: string; unitSystem?: 'metric' | 'imperial'; notifyRejections?: 'each' | 'digest' | 'off'; notifyDrift?: 'each' | 'off'; currentPassword?: string; newPassword?: string }): Promise<MeView> {
    const u = (await this.users.findById(c.principal.id))!;
    const patch: Partial<UserRow> = {};
    if (body.name) patch.name = body.name;
    if (body.unitSystem) patch.unit_system = body.unitSystem;
    if (body.notifyRejections) patch.notify_rejections = body.notifyRejections;
    if (body.notifyDrift) patch.notify_drift = body.notifyDrift;
    if (body.newPassword) {
      if (!u.password_hash || !(await argon2.verify(u.password_hash, body.currentPassword ?? ''))) {
        throw validationProblem([{ pointer: '/currentPassword', detail: 'is not your current password', code: 'password' }]);
      }
      patch.password_hash = await argon2.hash(body.newPassword);
    }
    // nothing to change (an empty body, or the same values): 200 with the profile as it is, no audit entry
    if (Object.keys(patch).length === 0) return this.tokens.me(u.id);
    await this.db.transaction(async (trx) => {
      await trx('users').where({ id: u.id }).update(patch);
      // a new password shuts out whoever held the old one: every other session ends, this one stays
      const sessionsEnded = body.newPassword ? await this.tokens.endOtherSessions(u.id, c.principal.kind === 'user' ? c.principal.sessionId : undefined, trx) : undefined;
      await this.audit.record({ organizationId: u.organization_id, ...actorOf(c.principal), action: body.newPassword ? 'user.password_changed' : 'user.profile_changed', targetType: 'user', targetId: u.id, details: { fields: Object.keys(body).filter((k) => !/password/i.test(k)), ...(sessionsEnded !== undefined ? { sessionsEnded } : {}) }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.tokens.me(u.id);
  }

  async list(c: RequestContext, q: ListQuery): Promise<{ rows: UserView[]; total: number | null }> {
    const { rows, total } = await listPage<UserRow>(this.db('users').where({ organization_id: c.principal.organizationId }), q, usersListSpec, userColumns);
    return { rows: rows.map(toUserView), total };
  }

  async get(c: RequestContext, id: string): Promise<UserView> {
    const u = await this.users.findInOrg(c.principal.organizationId, id);
    if (!u) throw notFound('person');
    return toUserView(u);
  }

  async update(c: RequestContext, id: string, body: { name?: string; role?: Role; disabled?: boolean }): Promise<UserView> {
    return this.db.transaction(async (trx) => {
      const u = await trx<UserRow>('users').where({ id, organization_id: c.principal.organizationId }).forUpdate().first();
      if (!u) throw notFound('person');
      const patch: Partial<UserRow> = {};
      if (body.name !== undefined && body.name !== u.name) patch.name = body.name;
      if (body.role !== undefined && body.role !== u.role) patch.role = body.role;
      if (body.disabled !== undefined && body.disabled !== u.disabled) patch.disabled = body.disabled;
      const losesAdmin = u.role === 'admin' && !u.disabled && (patch.role !== undefined || patch.disabled === true);
      if (losesAdmin && (await this.users.countActiveAdmins(c.principal.organizationId, trx)) <= 1) {
        throw new ProblemException(409, { detail: 'This is the last active admin of the organization; make someone else admin first.' });
      }
      if (Object.keys(patch).length === 0) return toUserView(u);
      const [row] = await trx<UserRow>('users').where({ id }).update(patch).returning('*');
      if (patch.disabled) await trx('refresh_tokens').where({ user_id: id }).whereNull('revoked_at').update({ revoked_at: trx.fn.now() });
      const action = patch.role !== undefined ? 'user.role_changed' : patch.disabled !== undefined ? (patch.disabled ? 'user.disabled' : 'user.enabled') : 'user.renamed';
      await this.audit.record({ organizationId: u.organization_id, ...actorOf(c.principal), action, targetType: 'user', targetId: id, details: { from: { role: u.role, disabled: u.disabled }, to: { role: row.role, disabled: row.disabled } }, ip: c.ip, userAgent: c.userAgent }, trx);
      return toUserView(row);
    });
  }

  async listInvitations(c: RequestContext, q: ListQuery) {
    const base = this.db('invitations')
      .leftJoin('users', 'users.id', 'invitations.invited_by')
      .where('invitations.organization_id', c.principal.organizationId)
      .select('invitations.*', 'users.name as inviter_name');
    const { rows, total } = await listPage<InvitationRow>(base, q, invitationsListSpec, invitationColumns);
    return { rows: rows.map(invitationView), total };
  }

  async getInvitation(c: RequestContext, id: string) {
    const r = await this.db('invitations').leftJoin('users', 'users.id', 'invitations.invited_by').where({ 'invitations.id': id, 'invitations.organization_id': c.principal.organizationId }).first('invitations.*', 'users.name as inviter_name');
    if (!r) throw notFound('invitation');
    return invitationView(r);
  }

  /**
   * The answer is the same whether or not the address already has an account (here or in another
   * organization): an admin must not learn who uses Pourgate elsewhere. The person learns what they
   * need from the mail: a link to set a password, or a note that the address is taken.
   */
  async invite(c: RequestContext, body: { email: string; role: Role; name?: string }) {
    const orgId = c.principal.organizationId;
    const existing = await this.users.findByEmail(body.email);
    const token = `inv_${randomBytes(24).toString('base64url')}`;
    const hours = this.config.get('INVITATION_TTL_HOURS', { infer: true });
    const expires = new Date(Date.now() + hours * 3600_000);
    const invitation = await this.db.transaction(async (trx) => {
      await trx('invitations').where({ organization_id: orgId, email: body.email }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: trx.fn.now() });
      const [row] = await trx('invitations').insert({ organization_id: orgId, email: body.email, role: body.role, name: body.name ?? null, token_hash: sha256(token), invited_by: c.principal.id, expires_at: expires }).returning('*');
      await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'invitation.sent', targetType: 'invitation', targetId: row.id, details: { email: body.email, role: body.role }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row;
    });
    const org = await this.db('organizations').where({ id: orgId }).first();
    const base = this.config.get('PUBLIC_URL', { infer: true });
    if (existing) {
      // no link: the address cannot take a second account, and the token is never sent
      await this.mail.send({
        to: body.email,
        subject: `You are invited to ${org.name} on Pourgate`,
        text: `${c.principal.name} invited you to ${org.name} on Pourgate as ${body.role}.\n\nThis e-mail address already has a Pourgate account, and one address holds one account. To join ${org.name}, ask ${c.principal.name} to invite another address of yours; your existing account stays as it is (sign in at ${base}/).\n\nIf you did not expect this, ignore this message.`,
      });
    } else {
      const link = `${base}/#/accept-invitation?token=${encodeURIComponent(token)}`;
      await this.mail.send({
        to: body.email,
        subject: `You are invited to ${org.name} on Pourgate`,
        text: `${c.principal.name} invited you to ${org.name} on Pourgate as ${body.role}.\n\nSet your password here (the link works once and expires in ${hours} hours):\n${link}\n\nIf you did not expect this, ignore this message.`,
      });
    }
    return this.getInvitation(c, invitation.id);
  }

  async revokeInvitation(c: RequestContext, id: string) {
    const n = await this.db('invitations').where({ id, organization_id: c.principal.organizationId }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: this.db.fn.now() });
    if (n === 1) await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'invitation.revoked', targetType: 'invitation', targetId: id, ip: c.ip, userAgent: c.userAgent });
    return this.getInvitation(c, id);
  }

  /**
   * What a link offers (shop, role, the address and the name the admin typed), for the acceptance
   * page; only a usable token answers, with the same 410 as accepting otherwise.
   */
  async lookupInvitation(token: string) {
    const inv = await this.db('invitations')
      .join('organizations', 'organizations.id', 'invitations.organization_id')
      .leftJoin('users', 'users.id', 'invitations.invited_by')
      .where({ 'invitations.token_hash': sha256(token) })
      .whereNull('invitations.accepted_at')
      .whereNull('invitations.revoked_at')
      .where('invitations.expires_at', '>', this.db.fn.now())
      .first('invitations.email', 'invitations.role', 'invitations.name', 'invitations.expires_at', 'organizations.name as organization_name', 'users.name as inviter_name');
    if (!inv) throw new ProblemException(410, { title: 'Invitation not usable', detail: 'This invitation link was already used, was revoked, or has expired. Ask your admin for a new one.' });
    return { organization: { name: inv.organization_name as string }, role: inv.role as Role, email: inv.email as string, name: (inv.name as string | null) ?? null, invitedBy: (inv.inviter_name as string | null) ?? null, expiresAt: new Date(inv.expires_at).toISOString() };
  }

  /** One use: the token is claimed in the same statement that checks it, so a second accept fails. */
  async acceptInvitation(body: { token: string; name: string; password: string }, origin: { ip: string; userAgent?: string }) {
    const hash = await argon2.hash(body.password);
    const user = await this.db.transaction(async (trx) => {
      const [inv] = await trx('invitations')
        .where({ token_hash: sha256(body.token) })
        .whereNull('accepted_at')
        .whereNull('revoked_at')
        .where('expires_at', '>', trx.fn.now())
        .update({ accepted_at: trx.fn.now() })
        .returning('*');
      if (!inv) throw new ProblemException(410, { title: 'Invitation not usable', detail: 'This invitation link was already used, was revoked, or has expired. Ask your admin for a new one.' });
      if (await trx('users').where({ email: inv.email }).first()) throw new ProblemException(409, { detail: 'A person with this e-mail already has an account.' });
      const [user] = await trx('users').insert({ organization_id: inv.organization_id, email: inv.email, name: body.name, role: inv.role, password_hash: hash }).returning('*');
      await this.audit.record({ organizationId: inv.organization_id, actorType: 'user', actorId: user.id, actorLabel: user.email, action: 'invitation.accepted', targetType: 'invitation', targetId: inv.id, details: { role: inv.role }, ip: origin.ip, userAgent: origin.userAgent }, trx);
      return user;
    });
    // the person who just set a password is signed in: no second sign-in after accepting
    const session = await this.tokens.startSession(user);
    return { email: user.email as string, role: user.role as Role, session };
  }
}
