// A binary min-heap of depot indices keyed by cost, with decrease-key: the priority queue behind
// Dijkstra. Typed arrays and a position index keep every operation O(log n) without allocation.

/** Min-heap over the integers 0..capacity-1; each may be in the heap at most once. */
export class IndexedMinHeap {
  private readonly heap: Int32Array;
  /** Position of each item in `heap`, or -1 when absent. */
  private readonly position: Int32Array;
  private readonly key: Float64Array;
  private count = 0;

  constructor(capacity: number) {
    this.heap = new Int32Array(capacity);
    this.position = new Int32Array(capacity).fill(-1);
    this.key = new Float64Array(capacity);
  }

  get size(): number {
    return this.count;
  }

  /** Empties the heap in O(size). */
  clear(): void {
    for (let i = 0; i < this.count; i++) this.position[this.heap[i]] = -1;
    this.count = 0;
  }

  /** Inserts `item` with `key`, or lowers its key when it is already present with a higher one. */
  push(item: number, key: number): void {
    const at = this.position[item];
    if (at === -1) {
      this.heap[this.count] = item;
      this.position[item] = this.count;
      this.key[item] = key;
      this.up(this.count++);
    } else if (key < this.key[item]) {
      this.key[item] = key;
      this.up(at);
    }
  }

  /** Removes and returns the item with the smallest key (ties: any). The heap must not be empty. */
  pop(): number {
    const heap = this.heap;
    const top = heap[0];
    this.position[top] = -1;
    const last = heap[--this.count];
    if (this.count > 0) {
      heap[0] = last;
      this.position[last] = 0;
      this.down(0);
    }
    return top;
  }

  private up(at: number): void {
    const { heap, position, key } = this;
    const item = heap[at];
    const k = key[item];
    while (at > 0) {
      const parentAt = (at - 1) >> 1;
      const parent = heap[parentAt];
      if (key[parent] <= k) break;
      heap[at] = parent;
      position[parent] = at;
      at = parentAt;
    }
    heap[at] = item;
    position[item] = at;
  }

  private down(at: number): void {
    const { heap, position, key } = this;
    const n = this.count;
    const item = heap[at];
    const k = key[item];
    for (;;) {
      let child = 2 * at + 1;
      if (child >= n) break;
      if (child + 1 < n && key[heap[child + 1]] < key[heap[child]]) child++;
      if (key[heap[child]] >= k) break;
      heap[at] = heap[child];
      position[heap[at]] = at;
      at = child;
    }
    heap[at] = item;
    position[item] = at;
  }
}
