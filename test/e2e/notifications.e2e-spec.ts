import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import argon2 from 'argon2';
import { startSmtpCatcher, type SmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { flexSystem } from './support/shop.js';

let t: TestApp;
let mail: SmtpCatcher;
let org: OrgFixture;
let auth: Record<Role, string>;
let scaleId: string;
const digestEmail = `digest-${randomUUID()}@notify.test`;
const quietEmail = `quiet-${randomUUID()}@notify.test`;

beforeAll(async () => {
  mail = await startSmtpCatcher();
  t = await startTestApp({ PROCESS_ROLE: 'all', NOTIFICATIONS: 'on', SMTP_URL: mail.smtpUrl, WEBHOOK_RELAY_INTERVAL_MS: '50', NOTIFY_INTERVAL_MS: '50', NOTIFY_DIGEST_INTERVAL_MS: '1500', PUBLIC_URL: 'http://127.0.0.1:3000' });
  org = await makeOrg('notify');
  auth = await tokensFor(t.http, org);
  const hash = await argon2.hash(randomUUID());
  await testDb()('users').insert([
    { organization_id: org.id, email: digestEmail, name: 'Digest engineer', role: 'engineer', password_hash: hash, notify_rejections: 'digest' },
    { organization_id: org.id, email: quietEmail, name: 'Quiet engineer', role: 'engineer', password_hash: hash, notify_rejections: 'off' },
  ]);
  [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'Bench scale 2', readability_kg: 0.001, capacity_kg: 10 }).returning('id');
}, 60_000);
afterAll(async () => {
  await t.close();
  await mail.close();
  await closeTestDb();
});

describe('e-mail about rejected readings', () => {
  it('tells each engineer as they chose: one message now, a digest later, or nothing', async () => {
    // 50 L at 40 kg/m³: 1 kg of A and 1 kg of B; masses held to ±25 % so only the ratio is off
    const sys = await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem({ ratio: { a: 100, b: 100 }, massTolerancePercent: 25 }));
    const batch = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: sys.body.id, freeRiseCup: { volume: { value: 50, unit: 'L' } } });
    const send = (subject: string, value: number) => t.http.post('/v1/readings').set('authorization', auth.engineer).send({ batchId: batch.body.id, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'mass', subject, value, unit: 'kg' });
    expect((await send('part_a', 1)).status).toBe(202);
    await new Promise((r) => setTimeout(r, 300));
    const off = await send('part_b', 1.2);
    expect(off.status).toBe(202);

    const each = await mail.waitFor((m) => m.to.includes(org.people.engineer.email), 20_000);
    expect(each.subject).toMatch(/^Rejected reading on batch .+: RATIO_ISOCYANATE_HEAVY$/);
    expect(each.text).toContain('part B (mass)');
    expect(each.text).toContain('from Bench scale 2');
    // the size of the ratio error, the heavy side in words (the reason's code and sentence)
    expect(each.text).toMatch(/measured 16\.6+7 % against a limit of 5 %/);
    expect(each.text).toContain(`http://127.0.0.1:3000/#/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected', batchId: batch.body.id }))}`);
    expect(each.text).toContain(off.body.id);
    expect(each.text).toMatch(/SDS/);

    const digest = await mail.waitFor((m) => m.to.includes(digestEmail), 20_000);
    expect(digest.subject).toBe('1 rejected reading to review');
    expect(digest.text).toContain(off.body.id);

    // the quiet engineer, the admin and the viewer get nothing; nobody gets two
    await new Promise((r) => setTimeout(r, 500));
    const mine = mail.messages.filter((m) => m.subject.includes('rejected reading') || m.subject.startsWith('Rejected reading'));
    expect(mine.filter((m) => m.to.includes(quietEmail) || m.to.includes(org.people.admin.email) || m.to.includes(org.people.viewer.email))).toEqual([]);
    expect(mine.filter((m) => m.to.includes(org.people.engineer.email))).toHaveLength(1);
    const rows = await testDb()('rejection_notices').where({ organization_id: org.id }).select('mode', 'status');
    expect(rows.map((r) => `${r.mode}:${r.status}`).sort()).toEqual(['digest:sent', 'each:sent']);
  });
});
