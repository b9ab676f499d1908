/** A row read from the candidate index with the upper bound of its score. */
export interface BoundedRow {
  readonly id: number;
  readonly price: number | null;
  readonly ub: number;
}

/** Highest bound first; equal bounds by id, so every search visits rows in one order. */
const before = (a: BoundedRow, b: BoundedRow) => a.ub > b.ub || (a.ub === b.ub && a.id < b.id);

/** Without a destructuring swap, which allocates while the code is cold: a search pushes thousands of rows. */
function swap(a: BoundedRow[], i: number, j: number): void {
  const t = a[i]!;
  a[i] = a[j]!;
  a[j] = t;
}

/** A binary max-heap of rows: a search may read thousands and evaluate a hundred. */
export class CandidateHeap {
  private readonly items: BoundedRow[] = [];

  get size(): number {
    return this.items.length;
  }

  peek(): BoundedRow | undefined {
    return this.items[0];
  }

  push(row: BoundedRow): void {
    const a = this.items;
    a.push(row);
    let i = a.length - 1;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!before(a[i]!, a[parent]!)) break;
      swap(a, i, parent);
      i = parent;
    }
  }

  pop(): BoundedRow | undefined {
    const a = this.items;
    const top = a[0];
    const last = a.pop();
    if (a.length > 0 && last) {
      a[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < a.length && before(a[l]!, a[m]!)) m = l;
        if (r < a.length && before(a[r]!, a[m]!)) m = r;
        if (m === i) break;
        swap(a, i, m);
        i = m;
      }
    }
    return top;
  }
}
