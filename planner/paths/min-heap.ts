// Binary min-heap of (priority, site) pairs on typed arrays; stale entries are skipped by the caller (lazy deletion).

export class MinHeap {
  private keys: Float64Array;
  private items: Int32Array;
  size = 0;

  constructor(capacity = 16) {
    this.keys = new Float64Array(Math.max(1, capacity));
    this.items = new Int32Array(Math.max(1, capacity));
  }

  push(key: number, item: number): void {
    if (this.size === this.keys.length) this.grow();
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      // Ties broken by item so the pop order never depends on insertion history.
      if (this.keys[parent] < key || (this.keys[parent] === key && this.items[parent] <= item)) break;
      this.keys[i] = this.keys[parent];
      this.items[i] = this.items[parent];
      i = parent;
    }
    this.keys[i] = key;
    this.items[i] = item;
  }

  /** Smallest key's item; read `lastKey` for its key. Call only when size > 0. */
  pop(): number {
    const top = this.items[0];
    this.lastKey = this.keys[0];
    const key = this.keys[--this.size];
    const item = this.items[this.size];
    let i = 0;
    for (;;) {
      let child = 2 * i + 1;
      if (child >= this.size) break;
      const right = child + 1;
      if (right < this.size && this.less(right, child)) child = right;
      if (key < this.keys[child] || (key === this.keys[child] && item <= this.items[child])) break;
      this.keys[i] = this.keys[child];
      this.items[i] = this.items[child];
      i = child;
    }
    this.keys[i] = key;
    this.items[i] = item;
    return top;
  }

  lastKey = 0;

  private less(x: number, y: number): boolean {
    return this.keys[x] < this.keys[y] || (this.keys[x] === this.keys[y] && this.items[x] < this.items[y]);
  }

  private grow(): void {
    const keys = new Float64Array(this.keys.length * 2);
    const items = new Int32Array(this.items.length * 2);
    keys.set(this.keys);
    items.set(this.items);
    this.keys = keys;
    this.items = items;
  }
}
