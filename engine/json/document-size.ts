// The largest scenario or workspace document any front end reads. Both hold settings and edits,
// never lane data, so a real one is a few hundred kilobytes; a file far past that is a wrong pick (a
// lanes export, a log) and reading and parsing it took tens of seconds before failing anyway.

/** 50 MB: refused before reading, in the CLI, Electron main and the browser host alike. */
export const MAX_DOCUMENT_BYTES = 50 * 1024 * 1024;

/** The one-line reason a document of `bytes` is refused, or null when it is within the limit. */
export function documentSizeProblem(bytes: number, label: 'scenario' | 'workspace'): string | null {
  if (bytes <= MAX_DOCUMENT_BYTES) return null;
  return `the file is ${bytes.toLocaleString('en')} bytes; a ${label} file is at most ${MAX_DOCUMENT_BYTES.toLocaleString('en')} bytes (50 MB: it holds settings and edits, not lane data), so it was not read`;
}
