// Reads the plain depots and lanes CSV layout (id,name,lat,lon and from,to,toll,fuel,fees,rebate).
// Every problem becomes an InputFileError naming file, row, column and value.

import { InputFileError, LanewrightError } from '../errors';
import { parseCsvText } from '../io/csv-papaparse';
import { parseMinor, ZERO, type Minor } from '../money/minor';
import type { DepotInput, LaneInput } from '../network/types';

function table(file: string, text: string, required: string[]) {
  if (text.trim() === '') throw new InputFileError(file, null, null, null, 'the file is empty');
  const { rows, issues } = parseCsvText(text);
  if (issues.length > 0) throw new InputFileError(file, issues[0].row, null, null, `unreadable CSV: ${issues[0].message}`);
  const header = rows[0].map((h) => h.trim().toLowerCase());
  for (const name of required) {
    if (!header.includes(name)) throw new InputFileError(file, 1, name, null, `required column "${name}" is missing`);
  }
  return { header, body: rows.slice(1) };
}

/** Reads depots; throws InputFileError on the first bad row. */
export function readDepotsCsv(file: string, text: string): DepotInput[] {
  const { header, body } = table(file, text, ['id', 'name', 'lat', 'lon']);
  const col = (name: string) => header.indexOf(name);
  return body.map((cells, i) => {
    const row = i + 2;
    const coordinate = (name: string, limit: number) => {
      const raw = (cells[col(name)] ?? '').trim();
      const value = Number(raw);
      if (raw === '' || !Number.isFinite(value)) throw new InputFileError(file, row, name, raw, 'not a number');
      if (Math.abs(value) > limit) throw new InputFileError(file, row, name, raw, `outside -${limit}..${limit} degrees`);
      return value;
    };
    const id = (cells[col('id')] ?? '').trim();
    if (id === '') throw new InputFileError(file, row, 'id', '', 'depot id is empty');
    return { id, name: (cells[col('name')] ?? '').trim(), lat: coordinate('lat', 90), lon: coordinate('lon', 180) };
  });
}

/** Reads lanes; a missing or empty amount column counts as 0. */
export function readLanesCsv(file: string, text: string): LaneInput[] {
  const { header, body } = table(file, text, ['from', 'to']);
  const col = (name: string) => header.indexOf(name);
  return body.map((cells, i) => {
    const row = i + 2;
    const amount = (name: string): Minor => {
      const c = col(name);
      const raw = c === -1 ? '' : (cells[c] ?? '').trim();
      if (raw === '') return ZERO;
      try {
        return parseMinor(raw);
      } catch (error) {
        if (error instanceof LanewrightError) throw new InputFileError(file, row, name, raw, error.message.replace(/^money: /, ''));
        throw error;
      }
    };
    const end = (name: string) => {
      const value = (cells[col(name)] ?? '').trim();
      if (value === '') throw new InputFileError(file, row, name, value, 'depot id is empty');
      return value;
    };
    return {
      from: end('from'),
      to: end('to'),
      toll: amount('toll'),
      fuel: amount('fuel'),
      fees: amount('fees'),
      rebate: amount('rebate'),
      sourceRow: row,
    };
  });
}
