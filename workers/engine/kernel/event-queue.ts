// The pending-event set of the simulation: a 4-ary min-heap on parallel typed arrays. Order is
// (time, priority, sequence), so events at the same time run by priority and then in the order they
// were scheduled: runs are deterministic. An event is a type code and two integer payloads; nothing
// is allocated per event once the arrays have grown to the model's working size.
//
// Why this shape: the heap arrays hold each entry's time and tie key (priority and sequence folded
// into one exact double) beside its slot, so a comparison reads two numbers next to each other
// instead of chasing a slot into three arrays; four children per node halve the depth of a sift for
// the same comparisons. The payload (kind, a, b) stays in its slot and is read once, at the pop.
// Cancellation is left to the model (generation counters in the payload), which is cheaper than
// removing entries from the middle of the heap.

const INITIAL_CAPACITY = 256;
/**
 * priority × SEQ_SPAN + sequence is an exact double for priorities below 2^9 and up to 2^44 (1.8e13)
 * events per replication, far beyond any event budget; priorities are the few named in priorities.ts.
 * Not checked per push: this is the hottest call of the engine.
 */
const SEQ_SPAN = 2 ** 44;

export class EventQueue {
  /** Heap order: entry i's time, tie key and slot. */
  private hTime = new Float64Array(INITIAL_CAPACITY);
  private hKey = new Float64Array(INITIAL_CAPACITY);
  private hSlot = new Int32Array(INITIAL_CAPACITY);
  /** Payload by slot; free slots are kept on a stack. */
  private kind = new Int32Array(INITIAL_CAPACITY);
  private a = new Int32Array(INITIAL_CAPACITY);
  private b = new Int32Array(INITIAL_CAPACITY);
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
    return this.size > 0 ? this.hTime[0] : Infinity;
  }

  push(time: number, priority: number, kind: number, a: number, b: number): void {
    let slot: number;
    if (this.freeTop > 0) slot = this.free[--this.freeTop];
    else {
      if (this.used === this.kind.length) this.grow();
      slot = this.used++;
    }
    this.kind[slot] = kind;
    this.a[slot] = a;
    this.b[slot] = b;
    this.siftUp(this.size++, time, priority * SEQ_SPAN + this.nextSeq++, slot, 0);
  }

  /** Removes the earliest event and exposes it through popTime, popKind, popA, popB. */
  pop(): boolean {
    const n = this.size;
    if (n === 0) return false;
    const slot = this.hSlot[0];
    this.popTime = this.hTime[0];
    this.popKind = this.kind[slot];
    this.popA = this.a[slot];
    this.popB = this.b[slot];
    this.free[this.freeTop++] = slot;
    const last = n - 1;
    this.size = last;
    if (last > 0) this.fill(0, this.hTime[last], this.hKey[last], this.hSlot[last]);
    return true;
  }

  /**
   * Puts the entry (time, key, slot) into the subheap whose root is the hole at top (Floyd's
   * bottom-up variant): the hole first sinks to a leaf along the earliest children, then the entry
   * rises from there, no higher than top. After a pop the entry is the one that was last, late as a
   * rule, so it rarely rises far, and the way down saves the comparison with it at every level.
   * Entries are unique (sequence), so the pop order is the same as that of any other heap.
   */
  private fill(top: number, time: number, key: number, slot: number): void {
    const ht = this.hTime;
    const hk = this.hKey;
    const hs = this.hSlot;
    const n = this.size;
    let i = top;
    for (;;) {
      const first = 4 * i + 1;
      if (first >= n) break;
      let best = first;
      let bt = ht[first];
      let bk = hk[first];
      const end = first + 4 < n ? first + 4 : n;
      for (let c = first + 1; c < end; c++) {
        const ct = ht[c];
        if (ct < bt || (ct === bt && hk[c] < bk)) {
          best = c;
          bt = ct;
          bk = hk[c];
        }
      }
      ht[i] = bt;
      hk[i] = bk;
      hs[i] = hs[best];
      i = best;
    }
    this.siftUp(i, time, key, slot, top);
  }

  /**
   * Moves every pending event of kind at most maxKind later by delta (a whole-line stop); the others
   * keep their times. Rare (a few times a shift), so the heap is simply rebuilt.
   */
  postpone(delta: number, maxKind: number): void {
    for (let i = 0; i < this.size; i++) if (this.kind[this.hSlot[i]] <= maxKind) this.hTime[i] += delta;
    for (let i = (this.size - 2) >> 2; i >= 0; i--) this.fill(i, this.hTime[i], this.hKey[i], this.hSlot[i]);
  }

  /** Places the entry (time, key, slot) at hole i or above it, no higher than top. */
  private siftUp(i: number, time: number, key: number, slot: number, top: number): void {
    const ht = this.hTime;
    const hk = this.hKey;
    const hs = this.hSlot;
    while (i > top) {
      const parent = (i - 1) >> 2;
      const pt = ht[parent];
      if (pt < time || (pt === time && hk[parent] < key)) break;
      ht[i] = pt;
      hk[i] = hk[parent];
      hs[i] = hs[parent];
      i = parent;
    }
    ht[i] = time;
    hk[i] = key;
    hs[i] = slot;
  }

  private grow(): void {
    const n = this.kind.length * 2;
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
    this.hTime = grow64(this.hTime);
    this.hKey = grow64(this.hKey);
    this.hSlot = grow32(this.hSlot);
    this.kind = grow32(this.kind);
    this.a = grow32(this.a);
    this.b = grow32(this.b);
    this.free = grow32(this.free);
  }
}
