// A cache keyed by content that keeps what the last two solves used and forgets the rest,
// so the editor's undo finds its entries without the cache growing with every drag.

export class GenerationMemo<V> {
  private live = new Map<string, V>();
  private older = new Map<string, V>();
  private next = new Map<string, V>();
  hits = 0;
  misses = 0;

  get(key: string, compute: () => V): V {
    let v = this.next.get(key);
    if (v !== undefined) return v;
    v = this.live.get(key) ?? this.older.get(key);
    if (v !== undefined) this.hits++;
    else {
      this.misses++;
      v = compute();
    }
    this.next.set(key, v);
    return v;
  }

  /** Called after each solve; after a patch, what it used joins the live generation instead of starting one. */
  endGeneration(patch = false): void {
    if (patch) {
      for (const [k, v] of this.next) this.live.set(k, v);
      this.next = new Map();
      this.hits = 0;
      this.misses = 0;
      return;
    }
    this.older = this.live;
    this.live = this.next;
    this.next = new Map();
    this.hits = 0;
    this.misses = 0;
  }
}
