import { describe, expect, it } from '@jest/globals';
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const scripts = Object.keys((JSON.parse(fs.readFileSync(path.join(ROOT, 'package.json'), 'utf8')) as { scripts: Record<string, string> }).scripts);

function npmRun(name: string, args: string[], env: NodeJS.ProcessEnv = {}): Promise<{ code: number | null; out: string }> {
  return new Promise((resolve) => {
    const child = spawn('npm', ['run', '--silent', name, '--', ...args], { cwd: ROOT, env: { ...process.env, NODE_OPTIONS: '', ...env } });
    let out = '';
    child.stdout.on('data', (d: Buffer) => (out += d));
    child.stderr.on('data', (d: Buffer) => (out += d));
    const timer = setTimeout(() => child.kill('SIGKILL'), 90_000);
    child.on('exit', (code) => {
      clearTimeout(timer);
      resolve({ code, out });
    });
  });
}

/** A few at a time: each is a Node process (some load TypeScript). */
async function inBatches<T, R>(items: T[], size: number, f: (x: T) => Promise<R>): Promise<R[]> {
  const out: R[] = [];
  for (let i = 0; i < items.length; i += size) out.push(...(await Promise.all(items.slice(i, i + size).map(f))));
  return out;
}

describe('every npm script of the project runs', () => {
  it('answers --help with exit code 0 and a usage text, touching nothing', async () => {
    expect(scripts).toEqual(expect.arrayContaining(['start', 'test', 'build', 'migrate', 'seed', 'demo', 'bench', 'test:faults', 'sdk:generate', 'docs:roles']));
    const runs = await inBatches(scripts, 4, async (name) => ({ name, ...(await npmRun(name, ['--help'])) }));
    const failed = runs.filter((r) => r.code !== 0 || !/usage|options/i.test(r.out)).map((r) => `${r.name} (exit ${r.code}): ${r.out.slice(0, 300)}`);
    expect(failed).toEqual([]);
  }, 240_000);

  it('migrate and seed have a dry run that reports and changes nothing', async () => {
    const before = await npmRun('migrate', ['--dry-run']);
    expect(before.code).toBe(0);
    expect(before.out).toMatch(/dry run: (migrations up to date|would apply)/);
    const seed = await npmRun('seed', ['--dry-run']);
    expect(seed.code).toBe(0);
    expect(seed.out).toMatch(/dry run \(rolled back\): demo seed would do: /);
    // the dry run of the seed kept nothing: a second one says the same
    expect((await npmRun('seed', ['--dry-run'])).out).toBe(seed.out);
  }, 180_000);
});
