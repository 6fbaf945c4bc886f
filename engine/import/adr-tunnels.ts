// Dangerous goods in road tunnels: which tunnel restriction codes may pass which tunnel categories.
// The table is UNECE ADR 2023, 8.6.4 (restrictions by tunnel restriction code of the whole load) over
// the tunnel categories A-E of 1.9.5.2.2; written from memory of the published text (see the test).

/** Tunnel categories of ADR 1.9.5.2.2; A has no dangerous-goods restriction, E the most. */
export type TunnelCategory = 'A' | 'B' | 'C' | 'D' | 'E';
export const TUNNEL_CATEGORIES: readonly TunnelCategory[] = ['A', 'B', 'C', 'D', 'E'];

/** Tunnel restriction codes of ADR 8.6.4 (Table A, column 15); "-" = no tunnel restriction. */
export type TunnelCode = 'B' | 'B1000C' | 'B/D' | 'B/E' | 'C' | 'C5000D' | 'C/D' | 'C/E' | 'D' | 'D/E' | 'E' | '-';

/** What the row of 8.6.4 depends on: nothing, tank carriage, bulk or tank carriage, or net explosive mass. */
export type TunnelCondition = 'always' | 'tank' | 'bulk-or-tank' | 'explosive-mass';

export interface TunnelCodeRow {
  condition: TunnelCondition;
  /** For 'explosive-mass': the net explosive mass per transport unit (kg) above which `whenMet` applies. */
  thresholdKg: number | null;
  /** Categories the load may not pass when the condition holds (or always). */
  whenMet: readonly TunnelCategory[];
  /** Categories it may not pass otherwise (equal to whenMet for 'always'). */
  otherwise: readonly TunnelCategory[];
}

const BCDE: readonly TunnelCategory[] = ['B', 'C', 'D', 'E'];
const CDE: readonly TunnelCategory[] = ['C', 'D', 'E'];
const DE: readonly TunnelCategory[] = ['D', 'E'];
const E: readonly TunnelCategory[] = ['E'];
const NONE: readonly TunnelCategory[] = [];
const always = (c: readonly TunnelCategory[]): TunnelCodeRow => ({ condition: 'always', thresholdKg: null, whenMet: c, otherwise: c });
const when = (condition: TunnelCondition, whenMet: readonly TunnelCategory[], otherwise: readonly TunnelCategory[], thresholdKg: number | null = null): TunnelCodeRow => ({
  condition,
  thresholdKg,
  whenMet,
  otherwise,
});

/** ADR 8.6.4 as data: a Map so a code read from a file is never looked up on a prototype. */
export const ADR_TUNNEL_TABLE: ReadonlyMap<TunnelCode, TunnelCodeRow> = new Map<TunnelCode, TunnelCodeRow>([
  ['B', always(BCDE)],
  ['B1000C', when('explosive-mass', BCDE, CDE, 1000)],
  ['B/D', when('tank', BCDE, DE)],
  ['B/E', when('tank', BCDE, E)],
  ['C', always(CDE)],
  ['C5000D', when('explosive-mass', CDE, DE, 5000)],
  ['C/D', when('tank', CDE, DE)],
  ['C/E', when('tank', CDE, E)],
  ['D', always(DE)],
  ['D/E', when('bulk-or-tank', DE, E)],
  ['E', always(E)],
  ['-', always(NONE)],
]);

/** How the goods travel; null fields are unknown and the stricter row of the table applies. */
export interface Carriage {
  tank: boolean | null;
  bulk: boolean | null;
  explosiveMassKg: number | null;
}

export const UNKNOWN_CARRIAGE: Carriage = { tank: null, bulk: null, explosiveMassKg: null };

/** A tunnel restriction code as written in a file ("c/d", " D/E ", "(C/D)"), or null when it is none. */
export function readTunnelCode(text: string): TunnelCode | null {
  const t = text.trim().toUpperCase().replace(/^\((.*)\)$/, '$1').replace(/\s+/g, '');
  const dashes = /^[-\u2013\u2014]$/;
  if (dashes.test(t)) return '-';
  return ADR_TUNNEL_TABLE.has(t as TunnelCode) ? (t as TunnelCode) : null;
}

/** A tunnel category letter, or null. */
export function readTunnelCategory(text: string): TunnelCategory | null {
  const t = text.trim().toUpperCase();
  return (TUNNEL_CATEGORIES as readonly string[]).includes(t) ? (t as TunnelCategory) : null;
}

export interface TunnelVerdict {
  forbidden: readonly TunnelCategory[];
  /** True when the carriage was unknown and the stricter row was taken. */
  assumedStricter: boolean;
}

/** Categories a load with `code` may not pass, given how it travels. */
export function forbiddenCategories(code: TunnelCode, carriage: Carriage = UNKNOWN_CARRIAGE): TunnelVerdict {
  const row = ADR_TUNNEL_TABLE.get(code)!;
  let met: boolean | null;
  switch (row.condition) {
    case 'always':
      return { forbidden: row.whenMet, assumedStricter: false };
    case 'tank':
      met = carriage.tank;
      break;
    case 'bulk-or-tank':
      met = carriage.tank === true || carriage.bulk === true ? true : carriage.tank === false && carriage.bulk === false ? false : null;
      break;
    case 'explosive-mass':
      met = carriage.explosiveMassKg === null ? null : carriage.explosiveMassKg > row.thresholdKg!;
      break;
  }
  if (met === null) return { forbidden: row.whenMet, assumedStricter: row.whenMet.length !== row.otherwise.length };
  return { forbidden: met ? row.whenMet : row.otherwise, assumedStricter: false };
}

/** Bit per category (A = 1, B = 2, ... E = 16), so a profile's categories compare as one number. */
export function categoryBits(categories: readonly TunnelCategory[]): number {
  let bits = 0;
  for (const c of categories) bits |= 1 << TUNNEL_CATEGORIES.indexOf(c);
  return bits;
}

export function categoryOfBit(index: number): TunnelCategory {
  return TUNNEL_CATEGORIES[index];
}
