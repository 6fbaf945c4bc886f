// Depot ids looked up straight from the text of a lanes file: the id is hashed over its characters
// where it stands in the line (FNV-1a), so a million lanes need no fresh id string and no string
// hashing per cell. Open addressing with linear probing; built once from the depots reader's Map.

export class DepotIdIndex {
  private readonly slots: Int32Array;
  private readonly mask: number;
  private readonly ids: string[];

  constructor(index: ReadonlyMap<string, number>) {
    let size = 16;
    while (size < index.size * 2) size *= 2;
    this.slots = new Int32Array(size).fill(-1);
    this.mask = size - 1;
    this.ids = [];
    for (const [id, depot] of index) {
      this.ids[depot] = id;
      let slot = hashRange(id, 0, id.length) & this.mask;
      while (this.slots[slot] !== -1) slot = (slot + 1) & this.mask;
      this.slots[slot] = depot;
    }
  }

  /** The depot whose id is exactly `text` from `start` to `end`, or -1. */
  find(text: string, start: number, end: number): number {
    const length = end - start;
    let slot = hashRange(text, start, end) & this.mask;
    for (;;) {
      const depot = this.slots[slot];
      if (depot === -1) return -1;
      const id = this.ids[depot];
      if (id.length === length) {
        let k = 0;
        while (k < length && id.charCodeAt(k) === text.charCodeAt(start + k)) k++;
        if (k === length) return depot;
      }
      slot = (slot + 1) & this.mask;
    }
  }
}

function hashRange(text: string, start: number, end: number): number {
  let h = 0x811c9dc5;
  for (let i = start; i < end; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return h >>> 0;
}
