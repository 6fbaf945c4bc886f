// The one way a count is put into words ("1 warning", "2 warnings", "1 loop carries"), so no
// message says "1 warning(s)" or "1 warnings". English only: the irregular plural is passed in.

/** The word for `n` of something: `singular` for exactly 1, else `plural` (default: singular + "s"). */
export function plural(n: number, singular: string, pluralForm = `${singular}s`): string {
  return n === 1 ? singular : pluralForm;
}

/** `n` and its word: counted(1, 'row') = "1 row", counted(3, 'row') = "3 rows". */
export function counted(n: number, singular: string, pluralForm?: string): string {
  return `${n} ${plural(n, singular, pluralForm)}`;
}
