// Text from a file shown in a message or printed to a terminal. Control characters, escape
// sequences and bidirectional overrides are written as visible escapes (\x1b, \u202e), so a file
// cannot clear a screen, retitle a terminal or reorder a line; a long value is shortened.

/** Characters shown escaped: C0 and C1 controls, DEL, bidi embeddings/overrides/isolates, line and paragraph separators. */
// eslint-disable-next-line no-control-regex -- matching control characters is the point of this pattern
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2028\u2029\u2066-\u2069]/g;

/** Characters a value is shortened to in a message. */
export const SHOWN_VALUE_LIMIT = 80;

function escapeOne(c: string): string {
  const code = c.charCodeAt(0);
  return code < 0x100 ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
}

/** `text` with every unsafe character escaped, except those listed in `keep` (e.g. "\n" for whole lines). */
export function escapeControls(text: string, keep = ''): string {
  return text.replace(UNSAFE, (c) => (keep.includes(c) ? c : escapeOne(c)));
}

/** A value as a message shows it: controls escaped, then cut to `limit` characters with "…". */
export function shownText(text: string, limit = SHOWN_VALUE_LIMIT): string {
  // Cut before escaping so the cut is by the file's characters; a long text is cut cheaply first.
  const head = text.length > limit * 2 + 2 ? text.slice(0, limit * 2 + 2) : text;
  const chars = Array.from(head);
  const cut = chars.length > limit || head.length < text.length;
  return escapeControls(cut ? chars.slice(0, limit).join('') : text) + (cut ? '…' : '');
}
