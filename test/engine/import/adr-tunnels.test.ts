// The ADR tunnel table against the published one, cell by cell. Source: UNECE ADR 2023 (applicable
// from 1 January 2023), 8.6.4 "Restrictions for the passage of transport units carrying dangerous
// goods through road tunnels" and the categories of 1.9.5.2.2. The wording below is from memory of
// the published table, not copied from a file; each row is parsed here and compared with the engine.

import { describe, expect, it } from 'vitest';
import {
  ADR_TUNNEL_TABLE,
  forbiddenCategories,
  readTunnelCategory,
  readTunnelCode,
  TUNNEL_CATEGORIES,
  type TunnelCategory,
  type TunnelCode,
} from '../../../engine/import/adr-tunnels';

// ADR 2023, 8.6.4, from memory: tunnel restriction code of the whole load -> restriction.
const PUBLISHED: [string, string][] = [
  ['B', 'Passage forbidden through tunnels of category B, C, D and E'],
  ['B1000C', 'Carriage where the total net explosive mass per transport unit exceeds 1 000 kg: Passage forbidden through tunnels of category B, C, D and E | does not exceed 1 000 kg: Passage forbidden through tunnels of category C, D and E'],
  ['B/D', 'Tank carriage: Passage forbidden through tunnels of category B, C, D and E | Other carriage: Passage forbidden through tunnels of category D and E'],
  ['B/E', 'Tank carriage: Passage forbidden through tunnels of category B, C, D and E | Other carriage: Passage forbidden through tunnels of category E'],
  ['C', 'Passage forbidden through tunnels of category C, D and E'],
  ['C5000D', 'Carriage where the total net explosive mass per transport unit exceeds 5 000 kg: Passage forbidden through tunnels of category C, D and E | does not exceed 5 000 kg: Passage forbidden through tunnels of category D and E'],
  ['C/D', 'Tank carriage: Passage forbidden through tunnels of category C, D and E | Other carriage: Passage forbidden through tunnels of category D and E'],
  ['C/E', 'Tank carriage: Passage forbidden through tunnels of category C, D and E | Other carriage: Passage forbidden through tunnels of category E'],
  ['D', 'Passage forbidden through tunnels of category D and E'],
  ['D/E', 'Bulk or tank carriage: Passage forbidden through tunnels of category D and E | Other carriage: Passage forbidden through tunnels of category E'],
  ['E', 'Passage forbidden through tunnels of category E'],
  ['-', 'Passage allowed through all tunnels'],
];

const lettersOf = (sentence: string): TunnelCategory[] => {
  const m = /category ([A-E](?:, [A-E])*(?: and [A-E])?)/.exec(sentence);
  return m ? (m[1].match(/[A-E]/g) as TunnelCategory[]) : [];
};

// [condition met, condition not met] per code, read from the published sentences.
const published = new Map(
  PUBLISHED.map(([code, text]) => {
    const [met, otherwise = met] = text.split(' | ');
    return [code as TunnelCode, { met: lettersOf(met), otherwise: lettersOf(otherwise) }];
  }),
);

const carriages = {
  met: (code: TunnelCode) =>
    code.includes('1000') ? { tank: null, bulk: null, explosiveMassKg: 1200 } : code.includes('5000') ? { tank: null, bulk: null, explosiveMassKg: 5001 } : { tank: true, bulk: false, explosiveMassKg: null },
  otherwise: (code: TunnelCode) =>
    code.includes('1000') ? { tank: null, bulk: null, explosiveMassKg: 1000 } : code.includes('5000') ? { tank: null, bulk: null, explosiveMassKg: 5000 } : { tank: false, bulk: false, explosiveMassKg: null },
};

describe('ADR tunnel table (UNECE ADR 2023, 8.6.4; from memory)', () => {
  it('has exactly the codes of the published table', () => {
    expect([...ADR_TUNNEL_TABLE.keys()].sort()).toEqual(PUBLISHED.map(([c]) => c).sort());
  });

  for (const [code] of PUBLISHED) {
    for (const side of ['met', 'otherwise'] as const) {
      it(`${code}, condition ${side}: every category A-E as published`, () => {
        const verdict = forbiddenCategories(code as TunnelCode, carriages[side](code as TunnelCode));
        const expected = published.get(code as TunnelCode)![side];
        for (const category of TUNNEL_CATEGORIES) {
          expect({ code, side, category, forbidden: verdict.forbidden.includes(category) }).toEqual({ code, side, category, forbidden: expected.includes(category) });
        }
        expect(verdict.assumedStricter).toBe(false);
      });
    }
  }

  it('category A is open to every code (ADR 1.9.5.2.2: category A has no restriction)', () => {
    for (const code of ADR_TUNNEL_TABLE.keys()) expect(forbiddenCategories(code).forbidden).not.toContain('A');
  });

  it('D/E: bulk carriage alone meets the condition', () => {
    expect(forbiddenCategories('D/E', { tank: false, bulk: true, explosiveMassKg: null }).forbidden).toEqual(['D', 'E']);
  });

  it('unknown carriage takes the stricter row and says so', () => {
    const v = forbiddenCategories('C/E');
    expect(v.forbidden).toEqual(['C', 'D', 'E']);
    expect(v.assumedStricter).toBe(true);
    expect(forbiddenCategories('D').assumedStricter).toBe(false);
  });

  it('reads codes and categories as files write them', () => {
    expect(readTunnelCode(' c/d ')).toBe('C/D');
    expect(readTunnelCode('(D/E)')).toBe('D/E');
    expect(readTunnelCode('\u2013')).toBe('-');
    expect(readTunnelCode('F')).toBeNull();
    expect(readTunnelCode('constructor')).toBeNull();
    expect(readTunnelCategory('d')).toBe('D');
    expect(readTunnelCategory('F')).toBeNull();
  });
});
