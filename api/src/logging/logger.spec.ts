import { describe, expect, it } from '@jest/globals';
import { Writable } from 'node:stream';
import { createLogger, prettyLogs, prettyStream } from './logger.js';

class Collect extends Writable {
  text = '';
  override _write(chunk: Buffer, _enc: string, done: () => void): void {
    this.text += chunk.toString('utf8');
    done();
  }
}

describe('log format', () => {
  it('is readable at a terminal in development and JSON when piped or in production', () => {
    expect(prettyLogs('auto', 'development', true)).toBe(true);
    expect(prettyLogs('auto', 'development', false)).toBe(false);
    expect(prettyLogs('auto', 'production', true)).toBe(false);
    expect(prettyLogs('json', 'development', true)).toBe(false);
    expect(prettyLogs('pretty', 'production', false)).toBe(true);
  });

  it('writes one readable line (level, message, fields) instead of JSON, with secrets still redacted', () => {
    const out = new Collect();
    const log = createLogger('info', prettyStream(out, false));
    log.info({ port: 3000, req: { headers: { authorization: 'Bearer secret-value' } } }, 'Pourgate listening');
    expect(out.text).toMatch(/INFO.*Pourgate listening/);
    expect(out.text).toContain('"port":3000');
    expect(out.text).not.toContain('secret-value');
    expect(() => JSON.parse(out.text)).toThrow();
  });
});
