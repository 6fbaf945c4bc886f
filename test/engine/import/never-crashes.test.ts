// Any text at all, as a depots or a lanes file, gives a report and never an exception, and the
// report never loses a row: accepted + rejected = total, per file and overall (fast-check).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';

const DEPOTS = 'id,name,lat,lon\nA,a,50,4\nB,b,51,5\n';
const piece = fc.constantFrom('A', 'B', 'Z', ',', ';', '\t', '"', '\n', '\r\n', ' ', '-', '1', '2.5', '1,5', '€', 'EUR', 'USD', '2026-01-01', 'x', '\u0000', '\ufffd', '\ufeff');
const text = fc.array(piece, { maxLength: 80 }).map((parts) => parts.join(''));
const header = fc.constantFrom('from,to,toll,fuel,fees,rebate,currency,distance_km,drive_minutes,valid_from,valid_to\n', 'from;to;toll;fuel\n', '');

describe('importer robustness', () => {
  it('never throws on arbitrary lanes text and keeps the counts balanced', () => {
    fc.assert(
      fc.property(header, text, (h, body) => {
        const r = importNetwork(DEPOTS, h + body);
        expect(r.report.accepted + r.report.rejected).toBe(r.report.total);
        for (const f of r.report.files) expect(f.accepted + f.rejected).toBe(f.total);
        for (const item of [...r.report.errors, ...r.report.warnings]) expect(typeof item.message).toBe('string');
        if (r.report.errors.length === 0) expect(r.network).not.toBeNull();
      }),
      { numRuns: 400 },
    );
  });

  it('never throws on arbitrary depots text', () => {
    fc.assert(
      fc.property(text, (body) => {
        const r = importNetwork('id,name,lat,lon\n' + body, 'from,to\n');
        expect(r.report.accepted + r.report.rejected).toBe(r.report.total);
      }),
      { numRuns: 300 },
    );
  });
});
