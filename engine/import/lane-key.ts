// Names a lane so that the name survives a re-import: source rows shift whenever someone edits the
// lanes file, but a lane's origin, destination and contract reference do not. Parallel lanes with
// the same three are told apart by their occurrence, counted in file order from 1.

import type { LaneInput, Network } from '../network/types';
import type { LaneTable } from './types';

/** A lane named by what it is, not where it sits in the file. */
export interface LaneKey {
  from: string;
  to: string;
  /** Contract reference (`LaneInput.ref`), null when the file gives none. */
  ref: string | null;
  /** 1 for the first lane in file order with this from/to/ref, 2 for the second, ... */
  occurrence: number;
}

type LaneLike = Pick<LaneInput, 'from' | 'to' | 'ref'>;

/** The group a lane's occurrence is counted in (same from, to and ref). */
export function laneGroupText(from: string, to: string, ref: string | null | undefined): string {
  return JSON.stringify([from, to, ref ?? null]);
}

/** One key per lane, in input order. */
export function laneKeysOf(source: readonly LaneLike[] | Network): LaneKey[] {
  const seen = new Map<string, number>();
  const keys: LaneKey[] = [];
  const count = 'laneCount' in source ? source.laneCount : source.length;
  for (let e = 0; e < count; e++) {
    let from: string, to: string, ref: string | null;
    if ('laneCount' in source) {
      from = source.depotIds[source.laneFrom[e]];
      to = source.depotIds[source.laneTo[e]];
      ref = source.laneRef[e] ?? null;
    } else {
      ({ from, to } = source[e]);
      ref = source[e].ref ?? null;
    }
    if (ref === '') ref = null;
    const group = laneGroupText(from, to, ref);
    const occurrence = (seen.get(group) ?? 0) + 1;
    seen.set(group, occurrence);
    keys.push({ from, to, ref, occurrence });
  }
  return keys;
}

/**
 * One key per row of the importer's lane table, occurrences counted over the whole file (every
 * date and class), which is what a scenario names: never over a date- or class-filtered network.
 */
export function laneKeysOfTable(table: LaneTable, depots: readonly { id: string }[]): LaneKey[] {
  const seen = new Map<string, number>();
  const keys: LaneKey[] = new Array(table.count);
  for (let i = 0; i < table.count; i++) {
    const from = depots[table.from[i]].id;
    const to = depots[table.to[i]].id;
    const ref = table.ref[i] || null;
    const group = laneGroupText(from, to, ref);
    const occurrence = (seen.get(group) ?? 0) + 1;
    seen.set(group, occurrence);
    keys[i] = { from, to, ref, occurrence };
  }
  return keys;
}

/** Printable form "FROM>TO|ref|n" (ref empty when null); accepted wherever a lane is named. */
export function laneKeyText(key: LaneKey): string {
  return `${key.from}>${key.to}|${key.ref ?? ''}|${key.occurrence}`;
}

/** 1st, 2nd, 3rd, 4th, 11th, 12th, 13th, 21st, ... (English ordinals). */
export function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : n % 10 === 1 ? 'st' : n % 10 === 2 ? 'nd' : n % 10 === 3 ? 'rd' : 'th';
  return `${n}${suffix}`;
}

/**
 * A lane named in words for people: "FRA → SXB, ref BFH-L-019", with ", 2nd row" when more than
 * one row has that origin, destination and ref. The key text ("FRA>SXB|BFH-L-019|2") stays for files.
 */
export function laneKeyWords(key: LaneKey): string {
  return `${key.from} → ${key.to}${key.ref ? `, ref ${key.ref}` : ', no ref'}${key.occurrence > 1 ? `, ${ordinal(key.occurrence)} row` : ''}`;
}

/** Reads "FROM>TO|ref|n" back; null when the text is not in that form. */
export function parseLaneKeyText(text: string): LaneKey | null {
  const match = /^([^>|]+)>([^>|]+)\|([^|]*)\|(\d+)$/.exec(text.trim());
  if (!match) return null;
  const occurrence = Number(match[4]);
  if (occurrence < 1) return null;
  return { from: match[1], to: match[2], ref: match[3] === '' ? null : match[3], occurrence };
}

/** Unambiguous identity of a key (depot ids may hold any character), for maps and sets. */
export function laneKeyId(key: LaneKey): string {
  return JSON.stringify([key.from, key.to, key.ref ?? null, key.occurrence]);
}

/** Map from laneKeyId to lane index, for resolving many keys against one lane list. */
export function laneKeyIndex(keys: readonly LaneKey[]): Map<string, number> {
  const index = new Map<string, number>();
  keys.forEach((key, e) => index.set(laneKeyId(key), e));
  return index;
}

/** True when both keys name the same lane. */
export function sameLaneKey(a: LaneKey, b: LaneKey): boolean {
  return a.from === b.from && a.to === b.to && (a.ref ?? null) === (b.ref ?? null) && a.occurrence === b.occurrence;
}
