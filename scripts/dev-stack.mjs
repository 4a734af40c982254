// usage: node scripts/dev-stack.mjs <pgPort> <redisPort> — starts (or reuses) a throw-away PostgreSQL + Redis pair under .data/ for a second development stack (prints the URLs)
const s = await import('./lib/services.mjs');
const [pgPort, redisPort] = process.argv.slice(2).map(Number);
const pg = await s.startPostgres({ name: `pg-dev-${pgPort}`, port: pgPort, fast: true, databases: ['pourgate'] });
const r = await s.startRedis({ name: `redis-dev-${redisPort}`, port: redisPort, durable: false });
console.log(`DATABASE_URL=${pg.url('pourgate')} REDIS_URL=${r.url}`);
