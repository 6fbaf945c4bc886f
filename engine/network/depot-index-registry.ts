// The id -> position Map of a depot list, remembered by whoever already built it (the depots reader
// builds one while it reads), so the network of each plan reuses it instead of hashing every id again
// (a quarter of a million depots took about half a second to index twice).

const known = new WeakMap<readonly object[], ReadonlyMap<string, number>>();

/** Records that `index` maps each depot's id in `depots` to its position, and nothing else. */
export function rememberDepotIndex(depots: readonly object[], index: ReadonlyMap<string, number>): void {
  known.set(depots, index);
}

/** The remembered index of `depots`, if it still covers exactly that many depots. */
export function knownDepotIndex(depots: readonly object[]): ReadonlyMap<string, number> | undefined {
  const index = known.get(depots);
  return index !== undefined && index.size === depots.length ? index : undefined;
}
