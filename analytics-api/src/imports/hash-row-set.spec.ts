import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { HashRowSet } from './hash-row-set';

const sha1 = (s: string) => createHash('sha1').update(s).digest('hex');

describe('HashRowSet', () => {
  it('remembers the first row of each digest and agrees with a Map over 50,000 keys (growing from 16)', () => {
    const set = new HashRowSet(8);
    const reference = new Map<string, number>();
    for (let i = 0; i < 60_000; i++) {
      const key = sha1(`record-${i % 50_000}`);
      expect(set.add(key, i)).toBe(reference.get(key));
      if (!reference.has(key)) reference.set(key, i);
    }
    expect(set.size).toBe(50_000);
    expect(set.get(sha1('record-123'))).toBe(123);
    expect(set.has(sha1('never added'))).toBe(false);
    expect(set.has(sha1('record-123').toUpperCase())).toBe(true);
  });
});
