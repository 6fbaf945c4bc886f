// Export file names that say what is inside (kind, origin, date, vehicle class, scenario) and are
// safe on every platform: ASCII letters, digits, dot, dash and underscore only, no reserved
// Windows device names, no leading or trailing dots, at most 120 characters before the extension.

export interface FileNameParts {
  /** What the file holds, e.g. "routes", "lanes", "route-RTM-MIL". */
  kind: string;
  origin?: string | null;
  /** ISO 8601 date planned for. */
  date?: string | null;
  vehicleClass?: string | null;
  /** Name of the what-if scenario, when the file describes one. */
  scenario?: string | null;
}

const RESERVED = /^(con|prn|aux|nul|com[0-9]|lpt[0-9])$/i;

/** One part of a name: accents dropped, anything else outside [A-Za-z0-9._-] becomes "-". */
export function safeNamePart(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/-{2,}/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '');
}

/** e.g. `routes-RTM-2026-08-15-2axle.csv`; `extension` without the dot. */
export function exportFileName(parts: FileNameParts, extension: string): string {
  const pieces = [parts.kind, parts.origin, parts.date, parts.vehicleClass, parts.scenario]
    .filter((p): p is string => typeof p === 'string' && p !== '')
    .map(safeNamePart)
    .filter((p) => p !== '');
  let stem = pieces.join('-').slice(0, 120).replace(/[-.]+$/, '');
  if (stem === '') stem = 'export';
  // "CON.csv" and "con-" style names still open the device on Windows when the stem is reserved.
  if (RESERVED.test(stem.split('.')[0])) stem = `_${stem}`;
  return `${stem}.${safeNamePart(extension) || 'txt'}`;
}
