// The pending-event set of the simulation: a binary min-heap of event slots held in typed arrays.
// Order is (time, priority, sequence), so events at the same time run by priority and then in the
// order they were scheduled: runs are deterministic. An event is a type code and two integer
// payloads; nothing is allocated per event once the arrays have grown to the model's working size.
// Cancellation is left to the model (generation counters in the payload), which is cheaper than
// removing entries from the middle of the heap.

const INITIAL_CAPACITY = 256;

export class EventQueue {
  private time = new Float64Array(INITIAL_CAPACITY);
  private seq = new Float64Array(INITIAL_CAPACITY);
  private prio = new Int32Array(INITIAL_CAPACITY);
  private kind = new Int32Array(INITIAL_CAPACITY);
  private a = new Int32Array(INITIAL_CAPACITY);
  private b = new Int32Array(INITIAL_CAPACITY);
  /** heap[i] is the slot of the i-th heap entry; free slots are kept on a stack. */
  private heap = new Int32Array(INITIAL_CAPACITY);
  private free = new Int32Array(INITIAL_CAPACITY);
  private freeTop = 0;
  private used = 0;
  private size = 0;
  private nextSeq = 0;

  /** Fields of the event most recently taken by pop(). */
  popTime = 0;
  popKind = 0;
  popA = 0;
  popB = 0;

  get length(): number {
    return this.size;
  }

  clear(): void {
    this.size = 0;
    this.used = 0;
    this.freeTop = 0;
    this.nextSeq = 0;
  }

  peekTime(): number {
    return this.size > 0 ? this.time[this.heap[0]] : Infinity;
  }

  push(time: number, priority: number, kind: number, a: number, b: number): void {
    const slot = this.allocate();
    this.time[slot] = time;
    this.seq[slot] = this.nextSeq++;
    this.prio[slot] = priority;
    this.kind[slot] = kind;
    this.a[slot] = a;
    this.b[slot] = b;
    this.heap[this.size] = slot;
    this.siftUp(this.size++);
  }

  /** Removes the earliest event and exposes it through popTime, popKind, popA, popB. */
  pop(): boolean {
    if (this.size === 0) return false;
    const slot = this.heap[0];
    this.popTime = this.time[slot];
    this.popKind = this.kind[slot];
    this.popA = this.a[slot];
    this.popB = this.b[slot];
    this.free[this.freeTop++] = slot;
    this.size--;
    if (this.size > 0) {
      this.heap[0] = this.heap[this.size];
      this.siftDown(0);
    }
    return true;
  }

  /**
   * Moves every pending event of kind at most maxKind later by delta (a whole-line stop); the others
   * keep their times. Rare (a few times a shift), so the heap is simply rebuilt.
   */
  postpone(delta: number, maxKind: number): void {
    for (let i = 0; i < this.size; i++) {
      const slot = this.heap[i];
      if (this.kind[slot] <= maxKind) this.time[slot] += delta;
    }
    for (let i = (this.size >> 1) - 1; i >= 0; i--) this.siftDown(i);
  }

  private before(x: number, y: number): boolean {
    const tx = this.time[x];
    const ty = this.time[y];
    if (tx !== ty) return tx < ty;
    const px = this.prio[x];
    const py = this.prio[y];
    if (px !== py) return px < py;
    return this.seq[x] < this.seq[y];
  }

  private siftUp(i: number): void {
    const heap = this.heap;
    const slot = heap[i];
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.before(slot, heap[parent])) break;
      heap[i] = heap[parent];
      i = parent;
    }
    heap[i] = slot;
  }

  private siftDown(i: number): void {
    const heap = this.heap;
    const n = this.size;
    const slot = heap[i];
    for (;;) {
      let child = 2 * i + 1;
      if (child >= n) break;
      if (child + 1 < n && this.before(heap[child + 1], heap[child])) child++;
      if (!this.before(heap[child], slot)) break;
      heap[i] = heap[child];
      i = child;
    }
    heap[i] = slot;
  }

  private allocate(): number {
    if (this.freeTop > 0) return this.free[--this.freeTop];
    if (this.used === this.time.length) this.grow();
    return this.used++;
  }

  private grow(): void {
    const n = this.time.length * 2;
    const grow64 = (x: Float64Array) => {
      const y = new Float64Array(n);
      y.set(x);
      return y;
    };
    const grow32 = (x: Int32Array) => {
      const y = new Int32Array(n);
      y.set(x);
      return y;
    };
    this.time = grow64(this.time);
    this.seq = grow64(this.seq);
    this.prio = grow32(this.prio);
    this.kind = grow32(this.kind);
    this.a = grow32(this.a);
    this.b = grow32(this.b);
    this.heap = grow32(this.heap);
    this.free = grow32(this.free);
  }
}
