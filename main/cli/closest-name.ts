// The option name a mistyped one was most likely meant to be, so a refusal can say what to type
// instead. Edit distance with adjacent transpositions (the optimal string alignment distance):
// one swapped, missing, extra or wrong character each count 1.

/** Optimal string alignment distance between `a` and `b` (Levenshtein plus adjacent swaps). */
export function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[] = new Array(rows * cols).fill(0);
  for (let i = 0; i < rows; i++) d[i * cols] = i;
  for (let j = 0; j < cols; j++) d[j] = j;
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[(i - 1) * cols + j] + 1, d[i * cols + j - 1] + 1, d[(i - 1) * cols + j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, d[(i - 2) * cols + j - 2] + 1);
      d[i * cols + j] = best;
    }
  }
  return d[rows * cols - 1];
}

/**
 * The candidate nearest to `typed`, or null when none is near: within 2 edits and at most a third
 * of the longer name (so `--to` does not suggest `--out`), or the only candidate that starts with
 * what was typed (at least 3 characters: `--veh` -> `--vehicle-class`).
 */
export function closestName(typed: string, candidates: readonly string[]): string | null {
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const name of candidates) {
    const distance = editDistance(typed, name);
    if (distance < bestDistance && distance <= 2 && distance <= Math.floor(Math.max(typed.length, name.length) / 3)) {
      best = name;
      bestDistance = distance;
    }
  }
  if (best !== null) return best;
  const prefixed = typed.length >= 3 ? candidates.filter((name) => name.startsWith(typed)) : [];
  return prefixed.length === 1 ? prefixed[0] : null;
}
