// The baseline for the single-reading benchmark: a bare Fastify route that does the same single
// INSERT into readings with pg, and nothing else (no auth, no schema, no outbox, no queue).
// BENCH_BARE_PORT, DATABASE_URL, BENCH_ORG, BENCH_BATCH, BENCH_DEVICE come from bench/run.ts.
import Fastify from 'fastify';
import pg from 'pg';

const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: Number(process.env.DATABASE_POOL_MAX ?? 10) });
const app = Fastify({ logger: false });
const { BENCH_ORG: org, BENCH_BATCH: batch, BENCH_DEVICE: device } = process.env;

app.post('/readings', async (req, reply) => {
  const b = req.body as { clientReadingId: string; quantity: string; subject: string; value: number; unit: string; stable?: boolean };
  const { rows } = await pool.query(
    `INSERT INTO readings (organization_id, batch_id, device_id, client_reading_id, quantity, subject, value_si, unit_given, value_given, stable)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10) RETURNING id, status`,
    [org, batch, device, b.clientReadingId, b.quantity, b.subject, b.value, b.unit, b.value, b.stable ?? true],
  );
  reply.status(202);
  return rows[0];
});

await app.listen({ port: Number(process.env.BENCH_BARE_PORT), host: '127.0.0.1' });
process.stdout.write('ready\n');
process.on('SIGTERM', () => void app.close().then(() => pool.end()).then(() => process.exit(0)));
