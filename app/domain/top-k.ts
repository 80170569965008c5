// A bounded heap that keeps the k best items seen so far, for searches too large to sort whole.

/** Negative when `a` ranks before (is better than) `b`, positive when after, 0 when equal. */
export type RankComparator<T> = (a: T, b: T) => number;

/**
 * Keeps the k best items under `compare`. The heap root is the worst kept item, so a new item
 * is tested against it in O(1) and inserted in O(log k).
 */
export class TopK<T> {
  readonly k: number;
  private readonly compare: RankComparator<T>;
  private readonly items: T[] = [];

  constructor(k: number, compare: RankComparator<T>) {
    if (!Number.isInteger(k) || k < 0) throw new RangeError(`k must be a whole number ≥ 0, got ${k}`);
    this.k = k;
    this.compare = compare;
  }

  get size(): number {
    return this.items.length;
  }

  /** True once k items are kept, so that the worst of them is a bar a newcomer must clear. */
  get isFull(): boolean {
    return this.items.length >= this.k;
  }

  /** The worst item kept, or undefined while the heap is empty. */
  worst(): T | undefined {
    return this.items[0];
  }

  /** Whether `item` would enter the heap: always while not full, else only if it beats the worst kept. */
  admits(item: T): boolean {
    if (this.k === 0) return false;
    if (!this.isFull) return true;
    return this.compare(item, this.items[0]) < 0;
  }

  /** Offers an item; returns true when it was kept. */
  push(item: T): boolean {
    if (!this.admits(item)) return false;
    if (this.isFull) {
      this.items[0] = item;
      this.siftDown(0);
    } else {
      this.items.push(item);
      this.siftUp(this.items.length - 1);
    }
    return true;
  }

  /** The kept items, best first. */
  toSortedArray(): T[] {
    return [...this.items].sort(this.compare);
  }

  // Heap order: a parent ranks after (is worse than or equal to) each child.
  private isWorse(i: number, j: number): boolean {
    return this.compare(this.items[i], this.items[j]) > 0;
  }

  private swap(i: number, j: number): void {
    const held = this.items[i];
    this.items[i] = this.items[j];
    this.items[j] = held;
  }

  private siftUp(start: number): void {
    let i = start;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.isWorse(i, parent)) return;
      this.swap(i, parent);
      i = parent;
    }
  }

  private siftDown(start: number): void {
    const n = this.items.length;
    let i = start;
    for (;;) {
      const left = 2 * i + 1;
      const right = left + 1;
      let worst = i;
      if (left < n && this.isWorse(left, worst)) worst = left;
      if (right < n && this.isWorse(right, worst)) worst = right;
      if (worst === i) return;
      this.swap(i, worst);
      i = worst;
    }
  }
}
