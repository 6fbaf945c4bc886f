// Cutting a plain line (no quote) into cells by character codes, for the readers' fast paths
// (lanes: lane-row-fast.ts, depots: depots-reader.ts). A cell is plain when the general reader would
// read it unchanged; anything else sends the row the general way, which owns every message.

/**
 * Cuts `text[start, end)` at the delimiter into exactly `starts.length` cells (their bounds into
 * `starts`/`ends`), each of them plain (`plainCell`); false when the line has more or fewer cells or
 * one that is not plain. One pass over the characters: a call to indexOf per cell costs more than
 * the few characters a cell holds.
 */
export function cutCells(text: string, start: number, end: number, delimiter: number, starts: Int32Array, ends: Int32Array): boolean {
  const last = starts.length - 1;
  let k = 0;
  let from = start;
  starts[0] = start;
  for (let i = start; i < end; i++) {
    if (text.charCodeAt(i) === delimiter) {
      if (k === last || !plainCell(text, from, i)) return false;
      ends[k] = i;
      from = i + 1;
      starts[++k] = from;
    }
  }
  if (k !== last || !plainCell(text, from, end)) return false;
  ends[k] = end;
  return true;
}

/**
 * A cell the general reader would read unchanged: nothing to trim at either end (ASCII only, so
 * Unicode spaces go the general way) and no leading apostrophe (the exporter's formula guard).
 */
function plainCell(text: string, start: number, end: number): boolean {
  if (start === end) return true;
  const first = text.charCodeAt(start);
  const last = text.charCodeAt(end - 1);
  return first > 32 && first < 127 && first !== 39 && last > 32 && last < 127;
}

// What each byte is to the byte reader of plain rows (lane-row-fast.ts): part of a plain cell, or
// anything else (the delimiter, a line break, a quote, a control character, any non-ASCII byte: a
// cell ends there, and a line holding any of the last three is decoded and read as text).
/** A byte that may stand in a plain cell: printable ASCII but the quote and the file's delimiter. */
export const CELL_BYTE = 0;
/** The apostrophe, a cell byte the reader notes (a kept cell holding one may carry the formula guard). */
export const APOSTROPHE_BYTE = 2;
const tables = new Map<number, Uint8Array>();

/** Per byte value, CELL_BYTE or not, for lines cut at `delimiter` (a `byteDelimiter` code). */
export function byteClasses(delimiter: number): Uint8Array {
  let table = tables.get(delimiter);
  if (table === undefined) {
    table = new Uint8Array(256).fill(1);
    for (let c = 32; c < 127; c++) if (c !== 34) table[c] = CELL_BYTE;
    table[39] = APOSTROPHE_BYTE;
    table[delimiter] = 1;
    tables.set(delimiter, table);
  }
  return table;
}
