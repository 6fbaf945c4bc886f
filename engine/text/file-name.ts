// A file name suggested for an export, safe on every platform the desktop app runs on: a depot id or
// scenario name may hold characters Windows refuses (: / \ * ? " < > |), control characters, a
// reserved device name (CON, NUL, COM1...), trailing dots or spaces, or be longer than a file
// system allows (255 bytes on ext4 and APFS, 255 UTF-16 units on NTFS).

/** Characters no platform allows in a name, or that start a folder: replaced by "-". */
// eslint-disable-next-line no-control-regex -- control characters are among what is removed
const UNSAFE = /[\u0000-\u001f\u007f-\u009f/\\:*?"<>|]+/g;

/** Windows device names, reserved with any extension (Microsoft "Naming Files, Paths, and Namespaces"). */
const RESERVED = /^(con|prn|aux|nul|com[0-9¹²³]|lpt[0-9¹²³])(\..*)?$/i;

/** Largest name in UTF-8 bytes: under every file system's 255, leaving room for a "(2)" a dialog may add. */
export const MAX_FILE_NAME_BYTES = 200;

/** UTF-8 length of `text` (the engine has no TextEncoder: it runs with the ES2022 library only). */
function utf8Bytes(text: string): number {
  let bytes = 0;
  for (const c of text) {
    const cp = c.codePointAt(0)!;
    bytes += cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
  }
  return bytes;
}

/** `stem.extension` made safe (see above); `extension` is given without its dot and kept whole. */
export function safeFileName(stem: string, extension: string, fallback = 'export'): string {
  let safe = stem
    .normalize('NFC')
    .replace(UNSAFE, '-')
    .replace(/-{2,}/g, '-')
    .replace(/^[\s.-]+|[\s.]+$/g, '');
  const suffix = `.${extension}`;
  const budget = MAX_FILE_NAME_BYTES - utf8Bytes(suffix);
  if (utf8Bytes(safe) > budget) {
    // Cut by whole characters (code points), never inside one.
    let bytes = 0;
    let cut = '';
    for (const c of safe) {
      bytes += utf8Bytes(c);
      if (bytes > budget) break;
      cut += c;
    }
    safe = cut.replace(/[\s.]+$/, '');
  }
  if (safe === '') safe = fallback;
  if (RESERVED.test(safe) || RESERVED.test(safe + suffix)) safe = `_${safe}`;
  return safe + suffix;
}
