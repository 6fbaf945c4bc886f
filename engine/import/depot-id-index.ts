// Depot ids looked up straight from the bytes of a lanes file: the id is hashed over its bytes where
// it stands in the line (FNV-1a), so a million lanes need no id string and no string hashing per
// cell. Open addressing with linear probing; built once from the depots reader's Map. Only ids of
// printable ASCII are held (the byte cutter sends any other byte the general way, which looks ids up
// in the Map). Lanes name depots in no order, so each lookup lands in a random place: what costs is
// memory misses, not arithmetic. A slot holds the depot, the full hash and (for ids of up to 8
// bytes) the bytes themselves, so a lookup touches one cache line; a longer id is compared against
// one flat array of every id's bytes.

const SLOT = 4; // Int32 words per slot: depot * 2 + inline flag, hash, bytes 0-3, bytes 4-7.
const INLINE_MAX = 8;

export class DepotIdIndex {
  private readonly slots: Int32Array;
  private readonly mask: number;
  /** Every held id's bytes, depot after depot (for ids too long to sit in a slot). */
  private readonly chars: Uint8Array;
  /** Depot d's bytes are chars[offsets[d], offsets[d + 1]). */
  private readonly offsets: Int32Array;
  // The key of the last range hashed (hash, packed characters, whether it fits a slot).
  private hash = 0;
  private low = 0;
  private high = 0;
  private inline = false;

  constructor(index: ReadonlyMap<string, number>) {
    let size = 16;
    while (size < index.size * 2) size *= 2;
    this.slots = new Int32Array(size * SLOT).fill(-1);
    this.mask = size - 1;
    const ids: string[] = new Array<string>(index.size);
    let total = 0;
    for (const [id, depot] of index) {
      if (!printableAscii(id)) continue;
      ids[depot] = id;
      total += id.length;
    }
    this.chars = new Uint8Array(total);
    this.offsets = new Int32Array(ids.length + 1);
    let at = 0;
    for (let d = 0; d < ids.length; d++) {
      this.offsets[d] = at;
      const id = ids[d] ?? '';
      for (let k = 0; k < id.length; k++) this.chars[at++] = id.charCodeAt(k);
    }
    this.offsets[ids.length] = at;
    for (let d = 0; d < ids.length; d++) {
      if (ids[d] === undefined) continue;
      this.key(this.chars, this.offsets[d], this.offsets[d + 1]);
      let slot = this.hash & this.mask;
      while (this.slots[slot * SLOT] !== -1) slot = (slot + 1) & this.mask;
      const b = slot * SLOT;
      this.slots[b] = d * 2 + (this.inline ? 1 : 0);
      this.slots[b + 1] = this.hash;
      this.slots[b + 2] = this.low;
      this.slots[b + 3] = this.high;
    }
  }

  /** The depot whose id is exactly bytes[start, end), or -1 (always for an id not printable ASCII). */
  find(bytes: Uint8Array, start: number, end: number): number {
    let h = FNV_OFFSET;
    for (let i = start; i < end; i++) h = Math.imul(h ^ bytes[i], FNV_PRIME);
    return this.findHashed(h, bytes, start, end);
  }

  /**
   * `find` for a caller that hashed the range as it read it (`FNV_OFFSET`, then per byte
   * `Math.imul(h ^ byte, FNV_PRIME)`): the bytes are looked at again only on a hash match.
   */
  findHashed(hash: number, bytes: Uint8Array, start: number, end: number): number {
    const inline = end - start <= INLINE_MAX;
    const slots = this.slots;
    let slot = hash & this.mask;
    for (;;) {
      const b = slot * SLOT;
      const entry = slots[b];
      if (entry === -1) return -1;
      if (slots[b + 1] === hash) {
        if ((entry & 1) === 1) {
          // Packed with zero padding: equal words mean equal length and characters.
          if (inline && slots[b + 2] === packed(bytes, start, Math.min(end, start + 4)) && slots[b + 3] === packed(bytes, start + 4, end)) return entry >> 1;
        } else if (!inline && this.sameBytes(entry >> 1, bytes, start, end)) return entry >> 1;
      }
      slot = (slot + 1) & this.mask;
    }
  }

  private sameBytes(depot: number, bytes: Uint8Array, start: number, end: number): boolean {
    const from = this.offsets[depot];
    const length = end - start;
    if (this.offsets[depot + 1] - from !== length) return false;
    const chars = this.chars;
    for (let k = 0; k < length; k++) if (chars[from + k] !== bytes[start + k]) return false;
    return true;
  }

  // FNV-1a over the range, and its bytes packed four to a word when the id can sit in a slot (at
  // most 8 bytes; a zero byte, never part of a held id, is the padding).
  private key(bytes: Uint8Array, start: number, end: number): void {
    let h = FNV_OFFSET;
    for (let i = start; i < end; i++) h = Math.imul(h ^ bytes[i], FNV_PRIME);
    this.hash = h;
    this.low = packed(bytes, start, Math.min(end, start + 4));
    this.high = packed(bytes, start + 4, end);
    this.inline = end - start <= INLINE_MAX;
  }
}

/** FNV-1a (32 bits) over a depot id's bytes: start from the offset, then per byte xor and multiply. */
export const FNV_OFFSET = 0x811c9dc5 | 0;
export const FNV_PRIME = 0x01000193;

// Up to four bytes from `from` (before `to`) in one word, the first lowest; 0 when the range is empty.
function packed(bytes: Uint8Array, from: number, to: number): number {
  let word = 0;
  for (let i = from; i < to; i++) word |= bytes[i] << (8 * (i - from));
  return word;
}

function printableAscii(id: string): boolean {
  for (let k = 0; k < id.length; k++) {
    const c = id.charCodeAt(k);
    if (c < 32 || c > 126) return false;
  }
  return true;
}
