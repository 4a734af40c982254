import { createCipheriv, createDecipheriv, createHash, randomBytes } from 'node:crypto';

/**
 * Webhook signing secrets must be readable to sign, so they are stored encrypted (AES-256-GCM)
 * with a key derived from SECRETS_KEY, never in plain text.
 */
export class SecretBox {
  private readonly key: Buffer;

  constructor(secretsKey: string) {
    this.key = createHash('sha256').update(`pourgate-secret-box:${secretsKey}`).digest();
  }

  seal(plain: string): string {
    const iv = randomBytes(12);
    const c = createCipheriv('aes-256-gcm', this.key, iv);
    const body = Buffer.concat([c.update(plain, 'utf8'), c.final()]);
    return ['v1', iv.toString('base64url'), c.getAuthTag().toString('base64url'), body.toString('base64url')].join('.');
  }

  open(sealed: string): string {
    const [v, iv, tag, body] = sealed.split('.');
    if (v !== 'v1') throw new Error('unknown secret-box version');
    const d = createDecipheriv('aes-256-gcm', this.key, Buffer.from(iv, 'base64url'));
    d.setAuthTag(Buffer.from(tag, 'base64url'));
    return Buffer.concat([d.update(Buffer.from(body, 'base64url')), d.final()]).toString('utf8');
  }
}

/** A Standard Webhooks secret: `whsec_` + base64 of 32 random bytes (the spec allows 24–64). */
export function newWebhookSecret(): string {
  return `whsec_${randomBytes(32).toString('base64')}`;
}
