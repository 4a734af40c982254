import { createCipheriv, createDecipheriv, createHash, hkdfSync, randomBytes } from 'node:crypto';

/** The AES-256-GCM key and its version label, both derived from one SECRETS_KEY value. */
interface BoxKey {
  version: string;
  key: Buffer;
}

const SALT = 'pourgate-secret-box';

/** HKDF-SHA-256 (RFC 5869) of the setting: the encryption key, and apart from it a short label. */
function deriveKey(secretsKey: string): BoxKey {
  const key = Buffer.from(hkdfSync('sha256', secretsKey, SALT, 'webhook-secret encryption v2', 32));
  const version = Buffer.from(hkdfSync('sha256', secretsKey, SALT, 'key version label', 6)).toString('hex');
  return { version, key };
}

/** Rows sealed before keys were versioned: a single SHA-256 of the setting. */
const legacyKey = (secretsKey: string) => createHash('sha256').update(`pourgate-secret-box:${secretsKey}`).digest();

/**
 * Secrets that must be readable again (webhook signing secrets, a stored response that carried a
 * key) are stored encrypted (AES-256-GCM)
 * with a key derived by HKDF from SECRETS_KEY, never in plain text. Each sealed secret is stored with
 * the version of the key that sealed it: after SECRETS_KEY changes, the former value goes into
 * SECRETS_KEY_PREVIOUS and old rows still open, while new ones are sealed with the new key.
 */
export class SecretBox {
  private readonly current: BoxKey;
  private readonly byVersion = new Map<string, Buffer>();
  private readonly legacy: Buffer[];

  constructor(secretsKey: string, previousKeys: string[] = []) {
    this.current = deriveKey(secretsKey);
    for (const k of [secretsKey, ...previousKeys]) {
      const d = deriveKey(k);
      if (!this.byVersion.has(d.version)) this.byVersion.set(d.version, d.key);
    }
    this.legacy = [secretsKey, ...previousKeys].map(legacyKey);
  }

  /** The version label stored beside secrets sealed now. */
  get version(): string {
    return this.current.version;
  }

  seal(plain: string): { sealed: string; version: string } {
    const iv = randomBytes(12);
    const c = createCipheriv('aes-256-gcm', this.current.key, iv);
    c.setAAD(Buffer.from(this.current.version));
    const body = Buffer.concat([c.update(plain, 'utf8'), c.final()]);
    return { sealed: ['v2', iv.toString('base64url'), c.getAuthTag().toString('base64url'), body.toString('base64url')].join('.'), version: this.current.version };
  }

  /** Opens a sealed secret with the key of its stored version (none: the legacy derivation). */
  open(sealed: string, version?: string | null): string {
    const [v, iv, tag, body] = sealed.split('.');
    if (v === 'v2') {
      if (!version) throw new Error('a v2 sealed secret needs its key version');
      const key = this.byVersion.get(version);
      if (!key) throw new Error(`no key of version ${version}: is SECRETS_KEY_PREVIOUS missing the former SECRETS_KEY?`);
      return decrypt(key, iv, tag, body, Buffer.from(version));
    }
    if (v !== 'v1') throw new Error('unknown secret-box version');
    let last: unknown;
    for (const key of this.legacy) {
      try {
        return decrypt(key, iv, tag, body);
      } catch (e) {
        last = e;
      }
    }
    throw last instanceof Error ? last : new Error('secret not readable with any configured key');
  }
}

function decrypt(key: Buffer, iv: string, tag: string, body: string, aad?: Buffer): string {
  const d = createDecipheriv('aes-256-gcm', key, Buffer.from(iv, 'base64url'));
  if (aad) d.setAAD(aad);
  d.setAuthTag(Buffer.from(tag, 'base64url'));
  return Buffer.concat([d.update(Buffer.from(body, 'base64url')), d.final()]).toString('utf8');
}

/** A Standard Webhooks secret: `whsec_` + base64 of 32 random bytes (the spec allows 24–64). */
export function newWebhookSecret(): string {
  return `whsec_${randomBytes(32).toString('base64')}`;
}
