// What the fakes' command lines share: "am I the program being run?", yargs, and the SDK client.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Pourgate } from '@pourgate/sdk';

export function isMain(moduleUrl: string): boolean {
  return !!process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(moduleUrl);
}

/** yargs over this process's arguments (loaded only when a fake runs as a program). */
export async function cli(usage: string, what: string) {
  const { default: yargs } = await import('yargs');
  const { hideBin } = await import('yargs/helpers');
  return yargs(hideBin(process.argv))
    .wrap(100)
    .usage(`${what}`).usage(`Usage: ${usage}`)
    .version(false)
    .option('api', { type: 'string', default: process.env.POURGATE_URL ?? 'http://127.0.0.1:3000', describe: 'Where Pourgate answers (without /v1)' })
    .option('key', { type: 'string', default: process.env.POURGATE_API_KEY, describe: 'API key (or set POURGATE_API_KEY)' })
    .strict()
    .help();
}

export function clientFor(api: string, key: string | undefined): Pourgate {
  if (!key) throw new Error('an API key is needed: --key or POURGATE_API_KEY');
  return new Pourgate({ baseUrl: api, apiKey: key });
}

export const sleep = (ms: number) => new Promise<void>((r) => setTimeout(r, ms));
