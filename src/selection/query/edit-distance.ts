/**
 * Optimal string alignment distance: substitutions, insertions, deletions and swaps of two
 * neighbours each cost one — the four slips of a hand typing a part number.
 */
export function editDistance(a: string, b: string): number {
  return editDistances(a, b).whole;
}

/**
 * From one table: slips from `a` to all of `b`, and to the closest start of `b` ("KTX1" is one
 * slip from the start of "KTR1A1000L").
 */
export function editDistances(a: string, b: string): { whole: number; toPrefix: number } {
  if (a === b) return { whole: 0, toPrefix: 0 };
  const rows: number[][] = [];
  for (let i = 0; i <= a.length; i++) {
    const row: number[] = [i];
    for (let j = 1; j <= b.length; j++) {
      if (i === 0) {
        row.push(j);
        continue;
      }
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(rows[i - 1]![j]! + 1, row[j - 1]! + 1, rows[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, rows[i - 2]![j - 2]! + 1);
      row.push(best);
    }
    rows.push(row);
  }
  const last = rows[a.length]!;
  return { whole: last[b.length]!, toPrefix: Math.min(...last) };
}

/** The closest name within two slips, for "did you mean". */
export function closestName(typed: string, names: readonly string[]): string | undefined {
  let best: { name: string; distance: number } | undefined;
  for (const name of names) {
    const distance = editDistance(typed.toLowerCase(), name);
    if (distance <= 2 && (!best || distance < best.distance)) best = { name, distance };
  }
  return best?.name;
}
