import { ConfigService } from '@nestjs/config';
import { createApp } from './app.factory.js';
import type { Env } from './config/env.js';

async function main(): Promise<void> {
  const app = await createApp();
  const config = app.get(ConfigService<Env, true>);
  const port = config.get('PORT', { infer: true });
  const host = config.get('HOST', { infer: true });
  await app.listen(port, host);
  app.getHttpAdapter().getInstance().log.info({ port, host, role: config.get('PROCESS_ROLE', { infer: true }) }, `Pourgate listening on http://${host}:${port}`);
}

main().catch((err: Error) => {
  // configuration errors name the bad variable; print them plainly, not as a stack
  process.stderr.write(`${err.message.startsWith('Invalid configuration') ? err.message : err.stack}\n`);
  process.exit(1);
});
