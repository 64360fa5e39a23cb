import { describe, expect, it } from 'vitest';
import { StampedCache } from './analytics-cache';

/** A cache over a fake store whose stamp and loads are counted, with a hand-moved clock. */
function fixture(stampMs = 5) {
  let clock = 0;
  let version = 1;
  const calls = { stamps: 0, loads: 0 };
  const cache = new StampedCache<{ version: number }>(
    async () => {
      calls.stamps++;
      clock += stampMs; // the stamp query takes stampMs
      return `v${version}`;
    },
    async () => {
      calls.loads++;
      return { version };
    },
    { now: () => clock, maxEntries: 2 },
  );
  return { cache, calls, change: () => version++, advance: (ms: number) => (clock += ms) };
}

describe('StampedCache', () => {
  it('trusts an entry for 10 × its stamp time, then re-checks and keeps it while the stamp holds', async () => {
    const f = fixture(5);
    expect((await f.cache.get('a')).data.version).toBe(1);
    expect(f.calls).toEqual({ stamps: 1, loads: 1 });
    f.advance(49);
    await f.cache.get('a');
    expect(f.calls.stamps).toBe(1);
    f.advance(2);
    await f.cache.get('a');
    expect(f.calls).toEqual({ stamps: 2, loads: 1 });
  });

  it('reloads and drops derived values when the stamp changes', async () => {
    const f = fixture(5);
    const first = await f.cache.get('a');
    expect(first.memo('x', () => 'derived from v1')).toBe('derived from v1');
    f.change();
    f.advance(100);
    const second = await f.cache.get('a');
    expect(second.data.version).toBe(2);
    expect(second.stamp).toBe('v2');
    expect(second.memo('x', () => 'derived from v2')).toBe('derived from v2');
    expect(f.calls.loads).toBe(2);
  });

  it('trusts a slow stamp for 4 × its time, then re-checks it behind the current entry (stale while revalidating)', async () => {
    const f = fixture(500);
    await f.cache.get('a');
    f.advance(1500);
    await f.cache.get('a');
    expect(f.calls.stamps).toBe(1); // 4 × 500 ms = 2 s of trust
    f.change();
    f.advance(600);
    const during = await f.cache.get('a'); // answered at once from the current entry
    expect(during.data.version).toBe(1);
    await new Promise((r) => setTimeout(r, 0)); // the background check and reload finish
    expect(f.calls).toEqual({ stamps: 2, loads: 2 });
    expect((await f.cache.get('a')).data.version).toBe(2);
  });

  it('shares one stamp query and one load among concurrent requests', async () => {
    const f = fixture(5);
    const entries = await Promise.all([f.cache.get('a'), f.cache.get('a'), f.cache.get('a')]);
    expect(new Set(entries).size).toBe(1);
    expect(f.calls).toEqual({ stamps: 1, loads: 1 });
    f.advance(100);
    await Promise.all([f.cache.get('a'), f.cache.get('a')]);
    expect(f.calls.stamps).toBe(2);
  });

  it('forgets the least recently used scope beyond maxEntries, and a failed load', async () => {
    const f = fixture(5);
    await f.cache.get('a');
    await f.cache.get('b');
    await f.cache.get('a');
    await f.cache.get('c'); // b is the least recently used
    await f.cache.get('a');
    expect(f.calls.loads).toBe(3);
    await f.cache.get('b');
    expect(f.calls.loads).toBe(4);

    let fail = true;
    const flaky = new StampedCache(async () => 's', async () => {
      if (fail) throw new Error('database away');
      return 1;
    });
    await expect(flaky.get('x')).rejects.toThrow('database away');
    fail = false;
    expect((await flaky.get('x')).data).toBe(1);
  });

  it('memo keeps a value until evicted and does not keep a rejected promise', async () => {
    const f = fixture(5);
    const entry = await f.cache.get('a');
    let computed = 0;
    entry.memo('k', () => ++computed);
    entry.memo('k', () => ++computed);
    expect(computed).toBe(1);
    await expect(entry.memo('p', () => Promise.reject(new Error('no')))).rejects.toThrow('no');
    await Promise.resolve();
    expect(await entry.memo('p', () => Promise.resolve('yes'))).toBe('yes');
  });
});
