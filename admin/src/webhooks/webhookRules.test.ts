import { describe, expect, it } from 'vitest';
import { canReplay, deliveryStatusView, endpointStateView, EVENT_TYPES, testVerdict } from './webhookRules';

const base = { durationMs: 42, eventId: 'e1' };

describe('testVerdict', () => {
  it('calls any 2xx delivered and says how long it took', () => {
    expect(testVerdict({ ...base, statusCode: 204, verdict: 'delivered' })).toMatchObject({ tone: 'success', title: 'Receiver answered 204' });
  });
  it('points at the secret when the receiver refuses the signature', () => {
    expect(testVerdict({ ...base, statusCode: 401, verdict: 'failed' }).detail).toMatch(/current secret/);
  });
  it('explains redirects, 410 and silence', () => {
    expect(testVerdict({ ...base, statusCode: 302, verdict: 'failed' }).detail).toMatch(/not followed/);
    expect(testVerdict({ ...base, statusCode: 410, verdict: 'failed' }).detail).toMatch(/stops the endpoint/);
    expect(testVerdict({ ...base, statusCode: null, error: 'connect ECONNREFUSED', verdict: 'failed' })).toMatchObject({ title: 'No answer', detail: 'connect ECONNREFUSED (after 42 ms)' });
    expect(testVerdict({ ...base, statusCode: null, ssrf: true, error: 'resolves to a private address', verdict: 'failed' }).title).toBe('Address refused');
  });
  it('treats 503 and 429 as worth retrying', () => {
    expect(testVerdict({ ...base, statusCode: 503, verdict: 'failed' }).tone).toBe('warning');
  });
});

describe('deliveries and endpoints', () => {
  it('lets only finished deliveries be replayed', () => {
    expect(canReplay({ status: 'dead' })).toBe(true);
    expect(canReplay({ status: 'succeeded' })).toBe(true);
    expect(canReplay({ status: 'retrying' })).toBe(false);
    expect(canReplay({ status: 'pending' })).toBe(false);
  });
  it('names the states in our words', () => {
    expect(deliveryStatusView('dead')).toEqual({ label: 'Gave up', tone: 'bad' });
    expect(endpointStateView({ enabled: false, disabledReason: 'receiver answered 410 Gone' }).label).toBe('Stopped by receiver');
    expect(endpointStateView({ enabled: false, disabledReason: 'disabled by a person' }).label).toBe('Paused');
  });
  it('offers exactly the event types of the API schema', () => {
    expect(EVENT_TYPES).toContain('batch.on_hold');
    expect(EVENT_TYPES).toContain('webhook.test');
  });
});
