import { describe, expect, it } from '@jest/globals';
import { Webhook } from 'standardwebhooks';
import { signatureHeader } from './webhook-sender.js';

describe('webhook signatures', () => {
  // The test vector published with the Standard Webhooks reference libraries (the spec's README and
  // its JavaScript tests): this secret, id, timestamp and payload sign to exactly this value.
  const secret = 'whsec_MfKQ9r8GKYqrTwjUPD8ILPZIo2LaLaSw';
  const id = 'msg_p5jXN8AQM9LWM0D4loKWxJek';
  const at = new Date(1614265330 * 1000);
  const payload = '{"test": 2432232314}';

  it('signs the published test vector to the published signature', () => {
    expect(signatureHeader([secret], id, at, payload)).toBe('v1,g0hM9SsE+OTPJTGt/tmIKtSyZlE3uFJELVlNIOLJ1OE=');
  });

  it('signs with both secrets during a rotation, and each verifies alone', () => {
    const other = 'whsec_' + Buffer.from('another-secret-of-32-bytes-long!').toString('base64');
    const header = signatureHeader([secret, other], id, at, payload);
    expect(header.split(' ')).toHaveLength(2);
    const headers = { 'webhook-id': id, 'webhook-timestamp': String(Math.floor(Date.now() / 1000)), 'webhook-signature': signatureHeader([secret, other], id, new Date(), payload) };
    expect(new Webhook(other).verify(payload, headers)).toEqual({ test: 2432232314 });
    expect(new Webhook(secret).verify(payload, headers)).toEqual({ test: 2432232314 });
  });
});
