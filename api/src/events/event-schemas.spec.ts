import { describe, expect, it } from '@jest/globals';
import { schemaRegistry } from '../common/schemas/schema-registry.js';
import { EVENT_TYPE_NAMES } from './event-types.js';

describe('event payload schemas', () => {
  const registry = schemaRegistry();
  it('has a data schema for every event type, and the envelope names exactly those types', () => {
    for (const t of EVENT_TYPE_NAMES) expect(registry.names()).toContain(`event.${t}`);
    const envelope = registry.get('event') as { properties: { type: { enum: string[] } } };
    expect([...envelope.properties.type.enum].sort()).toEqual([...EVENT_TYPE_NAMES].sort());
    const orphans = registry.names().filter((n) => /^event\.[a-z_]+\.[a-z_]+$/.test(n) && !EVENT_TYPE_NAMES.includes(n.slice(6) as never));
    expect(orphans).toEqual([]);
  });
  it('refuses a rejected reading without reasons and a batch move to an unknown state', () => {
    const id = '6f1c2d3e-0000-4000-8000-000000000001';
    const rejected = { readingId: id, batchId: id, deviceId: id, quantity: 'mass', subject: 'part_b', status: 'rejected', reasons: [] };
    expect(registry.validate('event.reading.rejected', rejected).length).toBeGreaterThan(0);
    expect(registry.validate('event.reading.rejected', { ...rejected, reasons: [{ code: 'RATIO_ISOCYANATE_HEAVY', message: 'm', measured: 5.1, limit: 5, unit: '%' }] })).toEqual([]);
    expect(registry.validate('event.batch.state_changed', { batchId: id, from: 'planned', to: 'cooling', reason: 'x' }).length).toBeGreaterThan(0);
  });
});
