import { describe, expect, it } from 'vitest';
import { ROLES } from '../../src/circuits/registry.js';
import { lazySchema } from '../../src/circuits/roles/lazy-schema.js';

describe('role schemas built on first use', () => {
  it('builds once, when first asked for', () => {
    let builds = 0;
    const schema = lazySchema(() => ({ n: ++builds }));
    expect(builds).toBe(0);
    expect(schema()).toBe(schema());
    expect(builds).toBe(1);
  });

  it('gives every role one schema object however often it is read', () => {
    for (const role of ROLES) expect(role.schema).toBe(role.schema);
  });
});
