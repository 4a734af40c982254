// The shop's ERP, as far as Pourgate sees it: it posts work orders with an integration key (the same
// externalRef again is harmless), receives signed webhooks at its gateway (erp-receiver, verified
// with the SDK), fetches the targets of each new batch for its material planning, and can catch up
// from the event feed when it was down.
import type { BatchTargets, Pourgate, PourgateEvent } from '@pourgate/sdk';
import { cli, clientFor, isMain } from './cli.js';
import { startErpReceiver, type ErpReceiver, type Received } from './erp-receiver.js';

export interface WorkOrderInput {
  externalRef: string;
  quantity: number;
  partNumber?: string | null;
  moldId?: string | null;
  materialSystemId?: string | null;
  dueOn?: string | null;
  notes?: string | null;
}

export interface Erp {
  receiver: ErpReceiver;
  /** Targets fetched per batch, as the ERP keeps them for material planning. */
  targets: Map<string, BatchTargets>;
  /** Verified events in arrival order, one per webhook-id. */
  events(): PourgateEvent[];
  postWorkOrders(orders: WorkOrderInput[]): Promise<{ externalRef: string; id: string; created: boolean }[]>;
  fetchTargets(batchId: string): Promise<BatchTargets>;
  /** The targets of every batch planned for a work order (batches listed with the shop:read scope). */
  targetsForWorkOrder(workOrderId: string): Promise<BatchTargets[]>;
  /** Everything in the event feed after `cursor` (the ERP's fallback when webhooks were missed). */
  catchUp(cursor?: string): Promise<{ events: PourgateEvent[]; cursor: string | undefined }>;
  waitForEvent(match: (e: PourgateEvent) => boolean, timeoutMs?: number): Promise<PourgateEvent>;
  close(): Promise<void>;
}

export interface ErpOptions {
  /** The ERP's integration key: scopes work-orders:write, targets:read, events:read, shop:read. */
  client: Pourgate;
  /** The webhook endpoint's signing secret (whsec_…), or a function for one set later. */
  secret: string | (() => string);
  port?: number;
  /** Fetch the targets of every batch.created event that arrives (default true). */
  fetchTargetsOnBatchCreated?: boolean;
  log?: (line: string) => void;
}

export async function startErp(opts: ErpOptions): Promise<Erp> {
  const log = opts.log ?? (() => undefined);
  const targets = new Map<string, BatchTargets>();
  const seen = new Set<string>();
  const fetchTargets = async (batchId: string) => {
    const t = await opts.client.batchTargets(batchId);
    targets.set(batchId, t);
    return t;
  };
  const onReceived = (r: Received) => {
    if (!r.verified || !r.event || seen.has(r.webhookId)) return;
    seen.add(r.webhookId);
    const e = r.event as unknown as PourgateEvent;
    log(`webhook ${e.type} (${r.webhookId})`);
    if (e.type === 'batch.created' && opts.fetchTargetsOnBatchCreated !== false) {
      const batchId = String((e.data as { batchId?: string }).batchId ?? e.subject.id);
      fetchTargets(batchId).then(
        (t) => log(`targets of batch ${batchId.slice(0, 8)}: A ${t.components.A.mass?.value} ${t.components.A.mass?.unit}, B ${t.components.B.mass?.value} ${t.components.B.mass?.unit}`),
        (err: Error) => log(`could not fetch targets of ${batchId}: ${err.message}`),
      );
    }
  };
  const receiver = await startErpReceiver({ secret: opts.secret, port: opts.port, onReceived });
  return {
    receiver,
    targets,
    events: () => receiver.events().map((r) => r.event as unknown as PourgateEvent),
    async postWorkOrders(orders) {
      const out = [];
      for (const o of orders) {
        const { data, response, error } = await opts.client.api.POST('/v1/work-orders', { body: o });
        if (!response.ok) await opts.client.unwrap(Promise.resolve({ data, error, response }));
        const id = (data as unknown as { id: string }).id;
        out.push({ externalRef: o.externalRef, id, created: response.status === 201 });
        log(`work order ${o.externalRef} ${response.status === 201 ? 'posted' : 'already there'} (${id.slice(0, 8)})`);
      }
      return out;
    },
    fetchTargets,
    async targetsForWorkOrder(workOrderId) {
      const out: BatchTargets[] = [];
      for await (const b of opts.client.paginate('/v1/batches', { filter: { workOrderId } })) out.push(await fetchTargets(b.id));
      return out;
    },
    async catchUp(cursor) {
      const feed = opts.client.events({ after: cursor });
      const events: PourgateEvent[] = [];
      for await (const e of feed) events.push(e);
      return { events, cursor: feed.cursor };
    },
    async waitForEvent(match, timeoutMs = 20_000) {
      const r = await receiver.waitFor((x) => x.verified && !!x.event && match(x.event as unknown as PourgateEvent), timeoutMs);
      return r.event as unknown as PourgateEvent;
    },
    close: () => receiver.close(),
  };
}

if (isMain(import.meta.url)) {
  const argv = await (await cli('$0 --secret whsec_… [--orders file.json]', 'erp: post work orders, receive and verify Pourgate webhooks, fetch batch targets'))
    .option('secret', { type: 'string', default: process.env.ERP_WEBHOOK_SECRET, describe: "The webhook endpoint's signing secret (or ERP_WEBHOOK_SECRET)" })
    .option('port', { type: 'number', default: 4100, describe: 'Port of the webhook receiver on 127.0.0.1 (path /webhooks/pourgate)' })
    .option('orders', { type: 'string', describe: 'JSON file with an array of work orders to post' })
    .parseAsync();
  if (!argv.secret) throw new Error('--secret (or ERP_WEBHOOK_SECRET) is needed to verify webhooks');
  const client = clientFor(argv.api, argv.key);
  const erp = await startErp({ client, secret: argv.secret, port: argv.port, log: (l) => console.log(`[erp] ${l}`) });
  console.log(`[erp] receiving webhooks at ${erp.receiver.url}`);
  if (argv.orders) {
    const fs = await import('node:fs/promises');
    await erp.postWorkOrders(JSON.parse(await fs.readFile(argv.orders, 'utf8')) as WorkOrderInput[]);
  }
  const stop = () => void erp.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
