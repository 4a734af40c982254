import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { startSmtpCatcher, SmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import { closeTestDb, makeOrg, OrgFixture, PASSWORD, signIn, testDb } from './support/fixtures.js';
import { startTestApp, TestApp } from './support/app.js';

let t: TestApp;
let mail: SmtpCatcher;
let org: OrgFixture;

beforeAll(async () => {
  mail = await startSmtpCatcher();
  t = await startTestApp({ SMTP_URL: mail.smtpUrl, PUBLIC_URL: 'http://127.0.0.1:3999' });
  org = await makeOrg('auth');
});
afterAll(async () => {
  await t.close();
  await mail.close();
  await closeTestDb();
});

describe('sign-in', () => {
  it.each(['admin', 'engineer', 'integrator', 'viewer'] as const)('each demo person signs in and sees their role: %s', async (role) => {
    const s = await signIn(t.http, `${role}@demo.test`, 'pourgate-demo');
    const me = await t.http.get('/v1/me').set('authorization', `Bearer ${s.token}`);
    expect(me.status).toBe(200);
    expect(me.body.role).toBe(role);
    expect(me.body.organization.name).toBe('Demo shop');
    expect(me.body.actions).toContain('profile:read');
    expect(me.body.actions.includes('people:manage')).toBe(role === 'admin');
  });

  it('a wrong password and an unknown e-mail get the same answer', async () => {
    const wrong = await t.http.post('/v1/auth/sign-in').send({ email: org.people.viewer.email, password: 'nope-nope-nope' });
    const unknown = await t.http.post('/v1/auth/sign-in').send({ email: 'nobody@nowhere.test', password: 'nope-nope-nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.headers['content-type']).toMatch(/problem\+json/);
    expect(wrong.body.detail).toBe(unknown.body.detail);
    expect(wrong.body.title).toBe(unknown.body.title);
  });

  it('a disabled account cannot sign in, and its old token stops working', async () => {
    const s = await signIn(t.http, org.people.integrator.email);
    await testDb()('users').where({ id: org.people.integrator.id }).update({ disabled: true });
    expect((await t.http.get('/v1/me').set('authorization', `Bearer ${s.token}`)).status).toBe(401);
    expect((await t.http.post('/v1/auth/sign-in').send({ email: org.people.integrator.email, password: PASSWORD })).status).toBe(401);
    await testDb()('users').where({ id: org.people.integrator.id }).update({ disabled: false });
  });

  it('bad bodies are 422 with pointers', async () => {
    const res = await t.http.post('/v1/auth/sign-in').send({ email: 'not-an-email', extra: 1 });
    expect(res.status).toBe(422);
    const pointers = res.body.errors.map((e: { pointer: string }) => e.pointer).sort();
    expect(pointers).toEqual(['/email', '/extra', '/password']);
  });
});

describe('refresh tokens rotate', () => {
  it('a refresh works once; reusing it is refused and ends the family', async () => {
    const s = await signIn(t.http, org.people.engineer.email);
    const r1 = await t.http.post('/v1/auth/refresh').send({ refreshToken: s.refreshToken });
    expect(r1.status).toBe(200);
    expect(r1.body.refreshToken).not.toBe(s.refreshToken);
    const reuse = await t.http.post('/v1/auth/refresh').send({ refreshToken: s.refreshToken });
    expect(reuse.status).toBe(401);
    // the reuse revoked the newer token too: whoever holds either copy must sign in again
    const r2 = await t.http.post('/v1/auth/refresh').send({ refreshToken: r1.body.refreshToken });
    expect(r2.status).toBe(401);
    const audit = await testDb()('audit_events').where({ organization_id: org.id, action: 'auth.refresh_reused' });
    expect(audit.length).toBe(1);
  });

  it('sign-out ends the session', async () => {
    const s = await signIn(t.http, org.people.viewer.email);
    expect((await t.http.post('/v1/auth/sign-out').send({ refreshToken: s.refreshToken })).status).toBe(204);
    expect((await t.http.post('/v1/auth/refresh').send({ refreshToken: s.refreshToken })).status).toBe(401);
  });
});

describe('invitations by e-mail', () => {
  it('an admin invites; the mail arrives; the link works once', async () => {
    const admin = await signIn(t.http, org.people.admin.email);
    const email = `newcomer.${Date.now()}@fixture.test`;
    const inv = await t.http.post('/v1/invitations').set('authorization', `Bearer ${admin.token}`).send({ email, role: 'engineer' });
    expect(inv.status).toBe(201);
    expect(inv.body.state).toBe('pending');
    const msg = await mail.waitFor((m) => m.to.includes(email));
    expect(msg.subject).toContain(org.name);
    const token = decodeURIComponent(/token=([^\s]+)/.exec(msg.text)![1]);
    expect(msg.text).toContain('http://127.0.0.1:3999/#/accept-invitation?token=');

    const accept = await t.http.post('/v1/invitations/accept').send({ token, name: 'New Comer', password: 'a-long-password-1' });
    expect(accept.status).toBe(200);
    expect(accept.body).toMatchObject({ email, role: 'engineer', session: { user: { email, role: 'engineer' } } });
    const again = await t.http.post('/v1/invitations/accept').send({ token, name: 'Someone Else', password: 'another-password-2' });
    expect(again.status).toBe(410);
    const s = await signIn(t.http, email, 'a-long-password-1');
    expect(s.body.user).toMatchObject({ email, role: 'engineer' });

    const listed = await t.http.get('/v1/invitations').set('authorization', `Bearer ${admin.token}`);
    expect(listed.body.find((i: { email: string }) => i.email === email).state).toBe('accepted');
    const audit = await testDb()('audit_events').where({ organization_id: org.id }).whereIn('action', ['invitation.sent', 'invitation.accepted']);
    expect(audit.map((a) => a.action).sort()).toEqual(['invitation.accepted', 'invitation.sent']);
  });

  it('an engineer cannot invite (403) and an expired link is refused (410)', async () => {
    const eng = await signIn(t.http, org.people.engineer.email);
    expect((await t.http.post('/v1/invitations').set('authorization', `Bearer ${eng.token}`).send({ email: 'x@fixture.test', role: 'admin' })).status).toBe(403);
    const admin = await signIn(t.http, org.people.admin.email);
    const email = `late.${Date.now()}@fixture.test`;
    await t.http.post('/v1/invitations').set('authorization', `Bearer ${admin.token}`).send({ email, role: 'viewer' });
    const msg = await mail.waitFor((m) => m.to.includes(email));
    const token = decodeURIComponent(/token=([^\s]+)/.exec(msg.text)![1]);
    await testDb()('invitations').where({ email }).update({ expires_at: new Date(Date.now() - 1000) });
    expect((await t.http.post('/v1/invitations/accept').send({ token, name: 'Late', password: 'a-long-password-1' })).status).toBe(410);
  });
});

describe('people administration', () => {
  it('the last admin cannot demote themselves; a role change is audited and takes effect at once', async () => {
    const admin = await signIn(t.http, org.people.admin.email);
    const auth = `Bearer ${admin.token}`;
    const self = await t.http.put(`/v1/users/${org.people.admin.id}`).set('authorization', auth).send({ role: 'viewer' });
    expect(self.status).toBe(409);
    const viewer = await signIn(t.http, org.people.viewer.email);
    expect((await t.http.get('/v1/users').set('authorization', `Bearer ${viewer.token}`)).status).toBe(403);
    const up = await t.http.put(`/v1/users/${org.people.viewer.id}`).set('authorization', auth).send({ role: 'admin' });
    expect(up.status).toBe(200);
    expect(up.body.role).toBe('admin');
    // same token, new role: the guard reads the role from the database, not the token
    expect((await t.http.get('/v1/users').set('authorization', `Bearer ${viewer.token}`)).status).toBe(200);
    await t.http.put(`/v1/users/${org.people.viewer.id}`).set('authorization', auth).send({ role: 'viewer' });
    const audit = await testDb()('audit_events').where({ organization_id: org.id, action: 'user.role_changed' });
    expect(audit.length).toBe(2);
  });
});
