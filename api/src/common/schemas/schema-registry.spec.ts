import { describe, expect, it } from '@jest/globals';
import { SchemaRegistry } from './schema-registry.js';

describe('SchemaRegistry', () => {
  const registry = new SchemaRegistry();

  it('loads and compiles every schema file', () => {
    expect(registry.names()).toEqual(expect.arrayContaining(['problem', 'quantity', 'device.create', 'api-key.create']));
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
});
