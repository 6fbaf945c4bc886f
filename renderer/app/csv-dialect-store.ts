// The CSV dialect the user picked for exports (separator, decimal mark, BOM), one value for the
// whole window: the Export menu, the route export and the dispatch sheet all read it here. It
// starts from the app's locale (engine dialectForLocale) and is kept in the browser's storage.

import { useSyncExternalStore } from 'react';
import { dialectForLocale, type CsvDialect } from '../../engine/index';

const KEY = 'lanewright.csv-dialect';
const listeners = new Set<() => void>();

function load(): CsvDialect {
  try {
    const v = JSON.parse(localStorage.getItem(KEY) ?? 'null') as Partial<CsvDialect> | null;
    if (v && (v.separator === ',' || v.separator === ';') && (v.decimalMark === '.' || v.decimalMark === ',') && typeof v.bom === 'boolean') {
      return { separator: v.separator, decimalMark: v.decimalMark, bom: v.bom };
    }
  } catch {
    // Unreadable: fall back to the locale's dialect.
  }
  return dialectForLocale(navigator.language);
}

let current: CsvDialect | null = null;

/** The dialect exports use now. */
export function csvDialect(): CsvDialect {
  return (current ??= load());
}

export function setCsvDialect(next: CsvDialect): void {
  current = next;
  try {
    localStorage.setItem(KEY, JSON.stringify(next));
  } catch {
    // Storage blocked: the choice holds for this session.
  }
  for (const l of listeners) l();
}

export function useCsvDialect(): CsvDialect {
  return useSyncExternalStore(
    (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    csvDialect,
  );
}
