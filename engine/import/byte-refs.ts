// Lane refs the byte reader kept as bytes: a million refs as a million strings cost the import about
// a sixth of its time (made, then copied by every young collection), and `check` never reads them.
// The bytes sit in one growing array; the lane table's `ref` column is made from them on first read,
// and the duplicate-lane check compares them where they lie. Rows before the first byte ref keep
// their refs in the builder's column; later refs read as text (the general reader's) wait in a Map.

import { asciiText } from '../text/utf8';

export class ByteRefs {
  private bytes = new Uint8Array(1 << 16);
  private used = 0;
  /** Per row: offset + 1 of its ref's bytes, 0 when the ref is text (or blank). */
  private at: Int32Array;
  private end: Int32Array;
  /** Per row kept here: FNV-1a of its bytes, so two different refs mostly differ at the first look. */
  private hash: Int32Array;
  /** Text refs of rows from `firstRow` on. */
  private readonly texts = new Map<number, string>();

  /** `head`: the refs of rows 0 .. head.length - 1 (the builder's column so far). */
  constructor(
    private readonly head: readonly (string | undefined)[],
    capacity: number,
  ) {
    this.at = new Int32Array(capacity);
    this.end = new Int32Array(capacity);
    this.hash = new Int32Array(capacity);
  }

  /** Keeps row `row`'s ref, the ASCII bytes[start, end) (never blank). */
  add(row: number, bytes: Uint8Array, start: number, end: number): void {
    const n = end - start;
    if (this.used + n > this.bytes.length) {
      const next = new Uint8Array(Math.max(this.bytes.length * 2, this.used + n));
      next.set(this.bytes.subarray(0, this.used));
      this.bytes = next;
    }
    // A loop, not set(subarray): a view per ref cost more than the few bytes it copies.
    const into = this.bytes;
    let at = this.used;
    let hash = 0x811c9dc5 | 0;
    for (let k = start; k < end; k++) {
      const c = bytes[k];
      into[at++] = c;
      hash = Math.imul(hash ^ c, 0x01000193);
    }
    this.at[row] = this.used + 1;
    this.used = at;
    this.end[row] = at;
    this.hash[row] = hash;
  }

  /** Row `row`'s ref as text (blank: undefined, nothing kept). */
  addText(row: number, ref: string | undefined): void {
    if (ref !== undefined) this.texts.set(row, ref);
  }

  /** Room for `capacity` rows (the lane table grew). */
  resize(capacity: number): void {
    const at = new Int32Array(capacity);
    at.set(this.at.subarray(0, Math.min(capacity, this.at.length)));
    const end = new Int32Array(capacity);
    end.set(this.end.subarray(0, Math.min(capacity, this.end.length)));
    const hash = new Int32Array(capacity);
    hash.set(this.hash.subarray(0, Math.min(capacity, this.hash.length)));
    this.at = at;
    this.end = end;
    this.hash = hash;
  }

  /** The ref column of rows 0 .. count - 1, every ref a string. */
  column(count: number): (string | undefined)[] {
    const column: (string | undefined)[] = [];
    for (let r = 0; r < count; r++) column.push(this.at[r] > 0 ? asciiText(this.bytes, this.at[r] - 1, this.end[r]) : this.text(r));
    return column;
  }

  /** Whether rows a and b have the same ref, without making strings of byte refs. */
  same(a: number, b: number): boolean {
    const sa = this.at[a];
    const sb = this.at[b];
    if (sa === 0 && sb === 0) return this.text(a) === this.text(b);
    if (sa > 0 && sb > 0) {
      if (this.hash[a] !== this.hash[b]) return false;
      const n = this.end[a] - (sa - 1);
      if (this.end[b] - (sb - 1) !== n) return false;
      for (let k = 0; k < n; k++) if (this.bytes[sa - 1 + k] !== this.bytes[sb - 1 + k]) return false;
      return true;
    }
    const [kept, other] = sa > 0 ? [a, b] : [b, a];
    const text = this.text(other);
    const from = this.at[kept] - 1;
    if (text === undefined || text.length !== this.end[kept] - from) return false;
    for (let k = 0; k < text.length; k++) if (text.charCodeAt(k) !== this.bytes[from + k]) return false;
    return true;
  }

  /** Row `row`'s ref hashed as `textRefHash` hashes its text. */
  refHash(row: number): number {
    return this.at[row] > 0 ? this.hash[row] : textRefHash(this.text(row));
  }

  private text(row: number): string | undefined {
    return row < this.head.length ? this.head[row] : this.texts.get(row);
  }
}

/** FNV-1a over a ref's UTF-16 code units (for an ASCII ref, the hash of its bytes); 0 for none. */
export function textRefHash(ref: string | undefined): number {
  if (ref === undefined) return 0;
  let h = 0x811c9dc5 | 0;
  for (let k = 0; k < ref.length; k++) h = Math.imul(h ^ ref.charCodeAt(k), 0x01000193);
  return h;
}
