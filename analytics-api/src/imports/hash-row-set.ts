/** The first 64 bits of a digest as two unsigned 32-bit halves (big-endian). */
const high = (d: Uint8Array) => ((d[0]! << 24) | (d[1]! << 16) | (d[2]! << 8) | d[3]!) >>> 0;
const low = (d: Uint8Array) => ((d[4]! << 24) | (d[5]! << 16) | (d[6]! << 8) | d[7]!) >>> 0;

/**
 * A set of SHA-1 digests (20 bytes), each remembered with the row it was first seen on, in flat
 * typed arrays (open addressing, linear probing on the first 64 bits of the digest). A Map of
 * strings costs about 100 bytes an entry; this costs 12, which keeps a million-row import
 * within its memory budget. Collisions on 64 bits of SHA-1 are negligible at this size
 * (about n²/2⁶⁵). Insert and lookup O(1) expected; grows by doubling.
 */
export class HashRowSet {
  private hi: Uint32Array;
  private lo: Uint32Array;
  private rows: Int32Array;
  private count = 0;

  constructor(capacity = 1024) {
    const size = 1 << Math.ceil(Math.log2(Math.max(16, capacity * 2)));
    this.hi = new Uint32Array(size);
    this.lo = new Uint32Array(size);
    this.rows = new Int32Array(size).fill(-1);
  }

  get size(): number {
    return this.count;
  }

  /** The row the digest was first added with, or undefined. */
  get(digest: Uint8Array): number | undefined {
    const i = this.find(high(digest), low(digest));
    return this.rows[i] >= 0 ? this.rows[i] : undefined;
  }

  has(digest: Uint8Array): boolean {
    return this.get(digest) !== undefined;
  }

  /** Adds the digest with its row unless present; returns the row it already had, if any. */
  add(digest: Uint8Array, row = 0): number | undefined {
    const h = high(digest);
    const l = low(digest);
    const i = this.find(h, l);
    if (this.rows[i] >= 0) return this.rows[i];
    this.hi[i] = h;
    this.lo[i] = l;
    this.rows[i] = row;
    if (++this.count * 2 > this.rows.length) this.grow();
    return undefined;
  }

  private find(h: number, l: number): number {
    const mask = this.rows.length - 1;
    let i = (h ^ Math.imul(l, 0x9e3779b1)) & mask;
    while (this.rows[i] >= 0 && (this.hi[i] !== h || this.lo[i] !== l)) i = (i + 1) & mask;
    return i;
  }

  private grow(): void {
    const { hi, lo, rows } = this;
    this.hi = new Uint32Array(rows.length * 2);
    this.lo = new Uint32Array(rows.length * 2);
    this.rows = new Int32Array(rows.length * 2).fill(-1);
    for (let j = 0; j < rows.length; j++) {
      if (rows[j] < 0) continue;
      const i = this.find(hi[j], lo[j]);
      this.hi[i] = hi[j];
      this.lo[i] = lo[j];
      this.rows[i] = rows[j];
    }
  }
}
