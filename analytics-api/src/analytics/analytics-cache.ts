/**
 * In-process cache of analytics inputs and results, keyed by scope (a set of rabbitries, or a
 * club) and checked against a cheap data stamp (analytics.repository.ts: counts, highest ids,
 * latest changes and checksums of everything the analytics read). Any import or edit changes
 * the stamp; the scope is then loaded afresh and everything derived from it is dropped.
 *
 * The stamp is not queried on every request. An entry is trusted for 10 × the time its last
 * stamp query took, at most 1 s (or 4 × the stamp time when that is longer):
 * - a quick stamp (≤ 50 ms: a herd, a demo club) is re-checked while the request waits, so a
 *   herd's reports show a change within a few milliseconds and a club's within a second;
 * - a slow stamp (every rabbitry of a large site pooled, a club of 500,000 results) is
 *   re-checked in the background while requests keep the current entry (stale while
 *   revalidating), and a changed scope is loaded in the background and swapped in when ready:
 *   a change shows after the trust time, the stamp query and the load (a few seconds there).
 * Concurrent requests share one stamp query and one load (single flight). Each process keeps
 * its own cache; the stamps keep processes behind a load balancer consistent with the database.
 */
export interface CacheEntry<D> {
  readonly key: string;
  readonly stamp: string;
  readonly data: D;
  /** Derived values (pedigree, F, growth references, BLUP solutions, serialized reports). */
  memo<T>(key: string, compute: () => T): T;
}

interface Slot<D> {
  stamp: string;
  checkedAt: number;
  stampMs: number;
  entry: Promise<CacheEntry<D>>;
  ready: boolean;
  checking: Promise<CacheEntry<D>> | null;
}

export interface StampedCacheOptions {
  /** Scopes kept; the least recently used goes first. */
  maxEntries?: number;
  /** Derived values kept per scope. */
  maxMemo?: number;
  /** Longest trust of a quick stamp (default 1 s). */
  maxTrustMs?: number;
  /** Stamps slower than this are re-checked in the background (default 50 ms). */
  backgroundStampMs?: number;
  now?: () => number;
}

export class StampedCache<D> {
  private readonly slots = new Map<string, Slot<D>>();
  private readonly maxEntries: number;
  private readonly maxMemo: number;
  private readonly maxTrustMs: number;
  private readonly backgroundStampMs: number;
  private readonly now: () => number;

  constructor(
    private readonly stampOf: (key: string) => Promise<string>,
    private readonly load: (key: string) => Promise<D>,
    options: StampedCacheOptions = {},
  ) {
    this.maxEntries = options.maxEntries ?? 32;
    this.maxMemo = options.maxMemo ?? 400;
    this.maxTrustMs = options.maxTrustMs ?? 1000;
    this.backgroundStampMs = options.backgroundStampMs ?? 50;
    this.now = options.now ?? (() => performance.now());
  }

  /** The scope's data, loaded afresh when its stamp has changed. */
  async get(key: string): Promise<CacheEntry<D>> {
    const slot = this.slots.get(key);
    if (!slot) return this.fill(key);
    this.slots.delete(key); // re-insert: Map order is the recency order
    this.slots.set(key, slot);
    const trust = Math.min(Math.max(this.maxTrustMs, 4 * slot.stampMs), 10 * slot.stampMs);
    if (this.now() - slot.checkedAt < trust) return slot.entry;
    if (slot.ready && slot.stampMs > this.backgroundStampMs) {
      slot.checking ??= this.revalidate(key, slot);
      return slot.entry;
    }
    slot.checking ??= this.recheck(key, slot);
    return slot.checking;
  }

  /** Quick stamps: the request waits for the check (and for a reload when the data changed). */
  private async recheck(key: string, slot: Slot<D>): Promise<CacheEntry<D>> {
    try {
      const started = this.now();
      const stamp = await this.stampOf(key);
      if (stamp === slot.stamp && this.slots.get(key) === slot) {
        slot.checkedAt = this.now();
        slot.stampMs = slot.checkedAt - started;
        return await slot.entry;
      }
      return await this.fill(key, { stamp, started });
    } finally {
      slot.checking = null;
    }
  }

  /** Slow stamps: check and reload behind the current entry, swapping the new one in when loaded. */
  private async revalidate(key: string, slot: Slot<D>): Promise<CacheEntry<D>> {
    try {
      const started = this.now();
      const stamp = await this.stampOf(key);
      const checkedAt = this.now();
      if (stamp !== slot.stamp) {
        const entry = this.entryOf(key, stamp, await this.load(key));
        if (this.slots.get(key) === slot) {
          this.slots.set(key, { stamp, checkedAt, stampMs: checkedAt - started, entry: Promise.resolve(entry), ready: true, checking: null });
        }
        return entry;
      }
      slot.checkedAt = checkedAt;
      slot.stampMs = checkedAt - started;
    } catch {
      // The current entry stays; the next request after the trust time tries again.
      slot.checkedAt = this.now();
    } finally {
      slot.checking = null;
    }
    return slot.entry;
  }

  private fill(key: string, known?: { stamp: string; started: number }): Promise<CacheEntry<D>> {
    // The slot exists before the stamp is known, so that concurrent requests share this fill;
    // until then it is trusted for maxTrustMs.
    const slot: Slot<D> = { stamp: known?.stamp ?? '', checkedAt: this.now(), stampMs: Infinity, entry: null as never, ready: false, checking: null };
    slot.entry = (async () => {
      const started = known?.started ?? this.now();
      const stamp = known?.stamp ?? (await this.stampOf(key));
      slot.stamp = stamp;
      slot.checkedAt = this.now();
      slot.stampMs = slot.checkedAt - started;
      // The stamp is read before the data: a change in between makes the next check reload.
      const entry = this.entryOf(key, stamp, await this.load(key));
      slot.ready = true;
      return entry;
    })();
    this.slots.set(key, slot);
    slot.entry.catch(() => {
      if (this.slots.get(key) === slot) this.slots.delete(key);
    });
    while (this.slots.size > this.maxEntries) this.slots.delete(this.slots.keys().next().value as string);
    return slot.entry;
  }

  private entryOf(key: string, stamp: string, data: D): CacheEntry<D> {
    const memo = new Map<string, unknown>();
    const maxMemo = this.maxMemo;
    return {
      key,
      stamp,
      data,
      memo<T>(memoKey: string, compute: () => T): T {
        if (memo.has(memoKey)) {
          const value = memo.get(memoKey) as T;
          memo.delete(memoKey);
          memo.set(memoKey, value);
          return value;
        }
        const value = compute();
        memo.set(memoKey, value);
        // A rejected promise is not kept: the next request tries again.
        if (value instanceof Promise) value.catch(() => { if (memo.get(memoKey) === value) memo.delete(memoKey); });
        while (memo.size > maxMemo) memo.delete(memo.keys().next().value as string);
        return value;
      },
    };
  }
}
