import { describe, expect, it } from '@jest/globals';
import fs from 'node:fs';
import { fileURLToPath } from 'node:url';
import { ACTIONS, actionsOf, API_KEY_SCOPES, DEVICE_KEY_SCOPES, KEY_SCOPE_GRANTS, matrixMarkdown, refusedScopes, roleAllows, ROLES } from './index.js';

describe('the role × action matrix', () => {
  it('is the table README.md shows (regenerate with npm run docs:roles)', () => {
    const readme = fs.readFileSync(fileURLToPath(new URL('../../../README.md', import.meta.url)), 'utf8');
    const between = /<!-- roles:start -->\n([\s\S]*?)\n<!-- roles:end -->/.exec(readme);
    expect(between?.[1]).toBe(matrixMarkdown());
  });

  it('gives only admins the people and audit actions, and only engineers the review', () => {
    for (const role of ROLES) {
      expect(roleAllows(role, 'people:manage')).toBe(role === 'admin');
      expect(roleAllows(role, 'audit:read')).toBe(role === 'admin');
      expect(roleAllows(role, 'readings:review')).toBe(role === 'engineer');
    }
    expect(actionsOf('viewer').every((a) => a.endsWith(':read'))).toBe(true);
  });

  it('names only known key scopes, and every scope opens at least one action', () => {
    const used = new Set(Object.values(ACTIONS).map((r) => ('scope' in r ? r.scope : undefined)).filter(Boolean));
    for (const s of used) expect(API_KEY_SCOPES).toContain(s);
    for (const s of API_KEY_SCOPES) expect(used.has(s)).toBe(true);
  });
});

describe('what keys may hold', () => {
  it('only roles that manage keys grant scopes, and integrators grant the device scopes only', () => {
    for (const role of ROLES) if (!roleAllows(role, 'api-keys:manage')) expect(KEY_SCOPE_GRANTS[role]).toEqual([]);
    expect([...KEY_SCOPE_GRANTS.integrator].sort()).toEqual([...DEVICE_KEY_SCOPES].sort());
    for (const s of DEVICE_KEY_SCOPES) expect(API_KEY_SCOPES).toContain(s);
  });

  it('a device key never holds a scope whose action the device role table does not need', () => {
    // a scale or logger posts readings and reads targets and devices; work orders and events are the ERP's
    expect(refusedScopes('admin', 'device', ['work-orders:write', 'events:read', 'shop:read'])).toEqual(['work-orders:write', 'events:read', 'shop:read']);
    expect(refusedScopes('integrator', 'device', ['readings:write', 'targets:read', 'devices:read'])).toEqual([]);
    expect(refusedScopes('integrator', 'integration', ['devices:read'])).toEqual([]);
    expect(refusedScopes('integrator', 'device', ['readings:write', 'work-orders:write', 'work-orders:write'])).toEqual(['work-orders:write']);
    expect(refusedScopes('viewer', 'device', ['devices:read'])).toEqual(['devices:read']);
  });
});
