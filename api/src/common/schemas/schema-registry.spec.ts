import { describe, expect, it } from '@jest/globals';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { SchemaRegistry } from './schema-registry.js';

describe('SchemaRegistry', () => {
  const registry = new SchemaRegistry();

  it('loads every schema file, and each compiles as a body and as a query', () => {
    expect(registry.names()).toEqual(expect.arrayContaining(['problem', 'quantity', 'device.create', 'api-key.create', 'reading.view', 'event.reading.accepted']));
    // compiling happens at first use for answers, events and queries: a broken one must fail here
    for (const name of registry.names()) for (const kind of ['body', 'query'] as const) expect(() => registry.validate(name, {}, kind)).not.toThrow();
  });

  it('reports each failure with a JSON Pointer', () => {
    const errors = registry.validate('device.create', { kind: 'scale', serial: '', extra: true, readability: { value: 'x', unit: 'g' } });
    const pointers = errors.map((e) => e.pointer).sort();
    expect(pointers).toEqual(['/capacity', '/extra', '/name', '/readability/value', '/serial']);
  });

  it('applies defaults and leaves valid bodies alone', () => {
    const body: Record<string, unknown> = { name: 'ERP', kind: 'integration', scopes: ['work-orders:write'] };
    expect(registry.validate('api-key.create', body)).toEqual([]);
    expect(body.environment).toBe('live');
  });

  it('rewrites references between files into OpenAPI component references', () => {
    const c = registry.openApiComponents();
    expect(JSON.stringify(c['device.create'])).toContain('"$ref":"#/components/schemas/quantity"');
    expect(c['device.create'].$id).toBeUndefined();
  });

  it('hoists a schema\'s own $defs into components, so a reference into them resolves in the document', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'schemas-'));
    const write = (name: string, body: object) => fs.writeFileSync(path.join(dir, `${name}.schema.json`), JSON.stringify({ $id: `urn:pourgate:schema:${name}`, ...body }));
    write('part', { type: 'object', properties: { side: { $ref: '#/$defs/side' } }, $defs: { side: { enum: ['A', 'B'] } } });
    write('pair', { type: 'object', properties: { first: { $ref: 'urn:pourgate:schema:part#/$defs/side' }, whole: { $ref: 'urn:pourgate:schema:part' } } });
    try {
      const c = new SchemaRegistry(dir).openApiComponents();
      expect(c['part.side']).toEqual({ enum: ['A', 'B'] });
      expect(c.part).toEqual({ type: 'object', properties: { side: { $ref: '#/components/schemas/part.side' } } });
      expect(c.pair!.properties).toEqual({ first: { $ref: '#/components/schemas/part.side' }, whole: { $ref: '#/components/schemas/part' } });
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
