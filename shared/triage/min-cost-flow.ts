/**
 * Minimum-cost maximum flow by successive shortest paths (Dijkstra with Johnson potentials on a binary heap),
 * each pass filled with a blocking flow on the edges of zero reduced cost. Costs are non-negative integers, so the
 * first potentials are zero and every comparison is exact. Edges live in typed arrays that grow by doubling; the
 * work arrays of a run are allocated once. Pure and deterministic: the same graph built in the same order gives
 * the same flow.
 */
export class MinCostFlow {
  private m = 0;
  private to: Int32Array;
  private cap: Int32Array;
  private cost: Float64Array;
  private next: Int32Array;
  private head: Int32Array;

  constructor(
    private n: number,
    edgeHint = 64,
  ) {
    this.head = new Int32Array(n).fill(-1);
    const size = Math.max(16, edgeHint * 2);
    this.to = new Int32Array(size);
    this.cap = new Int32Array(size);
    this.cost = new Float64Array(size);
    this.next = new Int32Array(size);
  }

  private grow() {
    const size = this.to.length * 2;
    const copy = <T extends Int32Array | Float64Array>(a: T, b: T) => (b.set(a), b);
    this.to = copy(this.to, new Int32Array(size));
    this.cap = copy(this.cap, new Int32Array(size));
    this.cost = copy(this.cost, new Float64Array(size));
    this.next = copy(this.next, new Int32Array(size));
  }

  /** Adds an edge and its residual twin; returns the edge's index for reading its flow later. */
  addEdge(from: number, to: number, capacity: number, cost: number): number {
    if (cost < 0) throw new RangeError('costs must be non-negative');
    if (this.m + 2 > this.to.length) this.grow();
    const e = this.m;
    this.m += 2;
    this.to[e] = to;
    this.to[e + 1] = from;
    this.cap[e] = Math.min(capacity, 0x3fffffff);
    this.cap[e + 1] = 0;
    this.cost[e] = cost;
    this.cost[e + 1] = -cost;
    this.next[e] = this.head[from];
    this.next[e + 1] = this.head[to];
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
   * then filled at once (Dinic's method on the zero-cost edges) before the next pass. Dijkstra stops at the sink:
   * potentials grow by min(distance, distance of the sink), which keeps every reduced cost non-negative.
   */
  run(s: number, t: number): { flow: number; cost: number } {
    const { n, to, cap, cost, next, head } = this;
    const potential = new Float64Array(n);
    const dist = new Float64Array(n);
    const done = new Uint8Array(n);
    const level = new Int32Array(n);
    const arc = new Int32Array(n);
    const queue = new Int32Array(n);
    const stack = new Int32Array(n + 1);
    // Each edge is relaxed at most once a pass, so the heap never holds more than m + 1 entries.
    const heapKey = new Float64Array(this.m + 1);
    const heapVal = new Int32Array(this.m + 1);
    let flow = 0;
    let total = 0;
    for (;;) {
      dist.fill(Infinity);
      done.fill(0);
      dist[s] = 0;
      // Binary heap with lazy deletion; ties go to the smaller node, which keeps runs deterministic.
      let size = 0;
      const push = (k: number, v: number) => {
        let i = size++;
        while (i > 0) {
          const p = (i - 1) >> 1;
          if (heapKey[p] < k || (heapKey[p] === k && heapVal[p] < v)) break;
          heapKey[i] = heapKey[p];
          heapVal[i] = heapVal[p];
          i = p;
        }
        heapKey[i] = k;
        heapVal[i] = v;
      };
      push(0, s);
      while (size > 0) {
        const d = heapKey[0];
        const u = heapVal[0];
        const lk = heapKey[--size];
        const lv = heapVal[size];
        let i = 0;
        for (;;) {
          const l = 2 * i + 1;
          if (l >= size) break;
          let c = l;
          const r = l + 1;
          if (r < size && (heapKey[r] < heapKey[l] || (heapKey[r] === heapKey[l] && heapVal[r] < heapVal[l]))) c = r;
          if (lk < heapKey[c] || (lk === heapKey[c] && lv < heapVal[c])) break;
          heapKey[i] = heapKey[c];
          heapVal[i] = heapVal[c];
          i = c;
        }
        heapKey[i] = lk;
        heapVal[i] = lv;
        if (done[u] || d > dist[u]) continue;
        done[u] = 1;
        if (u === t) break;
        const pu = potential[u];
        for (let e = head[u]; e !== -1; e = next[e]) {
          if (cap[e] <= 0) continue;
          const v = to[e];
          if (done[v]) continue;
          const nd = d + cost[e] + pu - potential[v];
          if (nd < dist[v]) {
            dist[v] = nd;
            push(nd, v);
          }
        }
      }
      const dt = dist[t];
      if (dt === Infinity) break;
      for (let v = 0; v < n; v++) potential[v] += dist[v] < dt ? dist[v] : dt;
      // Blocking flow on the edges whose reduced cost is now zero.
      for (;;) {
        level.fill(-1);
        level[s] = 0;
        let qh = 0;
        let qt = 0;
        queue[qt++] = s;
        while (qh < qt) {
          const u = queue[qh++];
          const pu = potential[u];
          for (let e = head[u]; e !== -1; e = next[e]) {
            const v = to[e];
            if (cap[e] > 0 && level[v] < 0 && cost[e] + pu - potential[v] === 0) {
              level[v] = level[u] + 1;
              queue[qt++] = v;
            }
          }
        }
        if (level[t] < 0) break;
        arc.set(head);
        // Iterative depth-first search for one path at a time along the level graph.
        for (;;) {
          let depth = 0;
          let u = s;
          while (u !== t) {
            let e = arc[u];
            for (; e !== -1; e = next[e]) {
              const v = to[e];
              if (cap[e] > 0 && level[v] === level[u] + 1 && cost[e] + potential[u] - potential[v] === 0) break;
            }
            arc[u] = e;
            if (e === -1) {
              if (depth === 0) break;
              level[u] = -1; // dead end: never visit again in this phase
              u = to[stack[--depth] ^ 1];
              arc[u] = next[arc[u]];
              continue;
            }
            stack[depth++] = e;
            u = to[e];
          }
          if (u !== t) break;
          let push1 = 0x3fffffff;
          for (let k = 0; k < depth; k++) push1 = Math.min(push1, cap[stack[k]]);
          for (let k = 0; k < depth; k++) {
            const e = stack[k];
            cap[e] -= push1;
            cap[e ^ 1] += push1;
            total += push1 * cost[e];
          }
          flow += push1;
        }
      }
    }
    return { flow, cost: total };
  }
}
