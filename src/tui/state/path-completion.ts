/** Tab on a typed path: the only completion, or the longest prefix all completions share. */
export function completePath(typed: string, completions: readonly string[]): string {
  if (completions.length === 0) return typed;
  if (completions.length === 1) return completions[0]!;
  let prefix = completions[0]!;
  for (const c of completions) {
    while (!c.startsWith(prefix)) prefix = prefix.slice(0, -1);
  }
  return prefix.length > typed.trim().length ? prefix : typed;
}
