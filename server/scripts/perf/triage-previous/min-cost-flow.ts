// The flow code as it was before the typed-array rewrite: the benchmark's same-run baseline only.
/**
 * Minimum-cost maximum flow by successive shortest paths (Dijkstra with Johnson potentials). All edge costs are
 * non-negative at the start, so the first potentials are zero. Pure and deterministic: the same graph built in
 * the same order gives the same flow.
 */
export class MinCostFlow {
  private to: number[] = [];
  private cap: number[] = [];
  private cost: number[] = [];
  private head: number[];
  private next: number[] = [];

  constructor(private n: number) {
    this.head = new Array(n).fill(-1);
  }

  /** Adds an edge and its residual twin; returns the edge's index for reading its flow later. */
  addEdge(from: number, to: number, capacity: number, cost: number): number {
    if (cost < 0) throw new RangeError('costs must be non-negative');
    const e = this.to.length;
    this.to.push(to, from);
    this.cap.push(capacity, 0);
    this.cost.push(cost, -cost);
    this.next.push(this.head[from], this.head[to]);
    this.head[from] = e;
    this.head[to] = e + 1;
    return e;
  }

  /** Flow on an edge returned by addEdge. */
  flow(edge: number): number {
    return this.cap[edge + 1];
  }

  /**
   * After each Dijkstra pass the potentials make every shortest path a path of zero reduced cost; all of them are
   * then filled at once with a blocking flow (Dinic's method on the zero-cost edges) before the next pass.
   */
  run(s: number, t: number): { flow: number; cost: number } {
    const n = this.n;
    const potential = new Float64Array(n);
    const dist = new Float64Array(n);
    const level = new Int32Array(n);
    const arc = new Int32Array(n);
    const queue = new Int32Array(n);
    let flow = 0;
    let total = 0;
    const reduced = (e: number, u: number) => this.cost[e] + potential[u] - potential[this.to[e]];
    for (;;) {
      dist.fill(Infinity);
      dist[s] = 0;
      const heap = new MinHeap();
      heap.push(0, s);
      while (heap.size) {
        const [d, u] = heap.pop();
        if (d > dist[u]) continue;
        for (let e = this.head[u]; e !== -1; e = this.next[e]) {
          if (this.cap[e] <= 0) continue;
          const v = this.to[e];
          const nd = d + reduced(e, u);
          if (nd < dist[v] - 1e-9) {
            dist[v] = nd;
            heap.push(nd, v);
          }
        }
      }
      if (dist[t] === Infinity) break;
      for (let v = 0; v < n; v++) if (dist[v] < Infinity) potential[v] += dist[v];
      // Blocking flow on the edges whose reduced cost is now zero.
      for (;;) {
        level.fill(-1);
        level[s] = 0;
        let qh = 0;
        let qt = 0;
        queue[qt++] = s;
        while (qh < qt) {
          const u = queue[qh++];
          for (let e = this.head[u]; e !== -1; e = this.next[e]) {
            const v = this.to[e];
            if (this.cap[e] > 0 && level[v] < 0 && Math.abs(reduced(e, u)) < 1e-9) {
              level[v] = level[u] + 1;
              queue[qt++] = v;
            }
          }
        }
        if (level[t] < 0) break;
        for (let v = 0; v < n; v++) arc[v] = this.head[v];
        const dfs = (u: number, limit: number): number => {
          if (u === t) return limit;
          for (; arc[u] !== -1; arc[u] = this.next[arc[u]]) {
            const e = arc[u];
            const v = this.to[e];
            if (this.cap[e] <= 0 || level[v] !== level[u] + 1 || Math.abs(reduced(e, u)) >= 1e-9) continue;
            const pushed = dfs(v, Math.min(limit, this.cap[e]));
            if (pushed > 0) {
              this.cap[e] -= pushed;
              this.cap[e ^ 1] += pushed;
              total += pushed * this.cost[e];
              return pushed;
            }
          }
          return 0;
        };
        let pushed: number;
        while ((pushed = dfs(s, Infinity)) > 0) flow += pushed;
      }
    }
    return { flow, cost: total };
  }
}

/** A binary heap of (key, value) pairs; ties go to the smaller value, which keeps runs deterministic. */
class MinHeap {
  private keys: number[] = [];
  private vals: number[] = [];
  get size() {
    return this.keys.length;
  }
  private less(i: number, j: number) {
    return this.keys[i] < this.keys[j] || (this.keys[i] === this.keys[j] && this.vals[i] < this.vals[j]);
  }
  private swap(i: number, j: number) {
    [this.keys[i], this.keys[j]] = [this.keys[j], this.keys[i]];
    [this.vals[i], this.vals[j]] = [this.vals[j], this.vals[i]];
  }
  push(key: number, val: number) {
    this.keys.push(key);
    this.vals.push(val);
    let i = this.keys.length - 1;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (!this.less(i, p)) break;
      this.swap(i, p);
      i = p;
    }
  }
  pop(): [number, number] {
    const top: [number, number] = [this.keys[0], this.vals[0]];
    const lastK = this.keys.pop()!;
    const lastV = this.vals.pop()!;
    if (this.keys.length) {
      this.keys[0] = lastK;
      this.vals[0] = lastV;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < this.keys.length && this.less(l, m)) m = l;
        if (r < this.keys.length && this.less(r, m)) m = r;
        if (m === i) break;
        this.swap(i, m);
        i = m;
      }
    }
    return top;
  }
}
