// Longest common subsequence of two id lists. Blocks outside it changed their place relative
// to the others ("moved"); a block merely shifted by an insertion above it stays inside it.

/** The ids of a longest common subsequence of `a` and `b` (ids are unique within each list). */
export function longestCommonSubsequence(a: readonly string[], b: readonly string[]): Set<string> {
  const n = a.length;
  const m = b.length;
  // table[i][j] = LCS length of a[i..] and b[j..]; documents have tens of blocks, so O(n·m) is fine
  const table: number[][] = Array.from({ length: n + 1 }, () => new Array<number>(m + 1).fill(0));
  for (let i = n - 1; i >= 0; i--) {
    for (let j = m - 1; j >= 0; j--) {
      table[i]![j] = a[i] === b[j] ? table[i + 1]![j + 1]! + 1 : Math.max(table[i + 1]![j]!, table[i]![j + 1]!);
    }
  }
  const kept = new Set<string>();
  let i = 0;
  let j = 0;
  while (i < n && j < m) {
    if (a[i] === b[j]) {
      kept.add(a[i]!);
      i++;
      j++;
    } else if (table[i + 1]![j]! >= table[i]![j + 1]!) i++;
    else j++;
  }
  return kept;
}

/** Ids present in both lists whose relative order differs: the smallest set of moves. */
export function movedIds(a: readonly string[], b: readonly string[]): Set<string> {
  const inB = new Set(b);
  const common = a.filter((id) => inB.has(id));
  const inA = new Set(common);
  const kept = longestCommonSubsequence(common, b.filter((id) => inA.has(id)));
  return new Set(common.filter((id) => !kept.has(id)));
}
