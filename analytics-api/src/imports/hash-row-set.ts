/** Eight hex digits from `at` as an unsigned 32-bit number, without cutting a substring. */
function hex32(hex: string, at: number): number {
  let n = 0;
  for (let i = at; i < at + 8; i++) {
    const c = hex.charCodeAt(i);
    n = n * 16 + (c <= 57 ? c - 48 : (c | 32) - 87);
  }
  return n;
}

/**
 * A set of 40-hex SHA-1 digests, each remembered with the row it was first seen on, in flat
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
  get(hex: string): number | undefined {
    const i = this.find(hex32(hex, 0), hex32(hex, 8));
    return this.rows[i] >= 0 ? this.rows[i] : undefined;
  }

  has(hex: string): boolean {
    return this.get(hex) !== undefined;
  }

  /** Adds the digest with its row unless present; returns the row it already had, if any. */
  add(hex: string, row = 0): number | undefined {
    const h = hex32(hex, 0);
    const l = hex32(hex, 8);
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
