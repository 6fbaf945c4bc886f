// CSV dialects: a semicolon file with decimal commas and a UTF-8 BOM reads back with the project's
// own importer (same lanes, same amounts) and with papaparse itself (columns split, "Liège" intact);
// numbers-as-text columns such as refs are left alone; formula-like text stays neutralised; the
// locale decides the default (decimal marks from the CLDR data in Intl, e.g. de-DE "1,5", en-GB "1.5").

// The file is read with papaparse itself, as an outside reader (tests may import it directly).
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { findDistinctLoops } from '../../../engine/audit/distinct-loops';
import { applyCsvDialect, DECIMAL_COMMA_DIALECT, dialectForLocale, formatCsvDialect, parseCsvDialect, RFC4180_DIALECT } from '../../../engine/export/csv-dialect';
import { lanesCsv } from '../../../engine/export/lanes-csv';
import { routesCsv } from '../../../engine/export/routes-csv';
import { importNetwork } from '../../../engine/planning/import-network';
import { routesReport } from '../../../engine/report/routes-report';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';

const depots = 'id,name,lat,lon\nLGG,Liège Trilogiport,50.683,5.66\nAAC,Aachen,50.776,6.084\nKBL,Koblenz,50.356,7.599\n';
const lanes = [
  'from,to,ref,toll,fuel,fees,rebate,currency,distance_km,drive_minutes,notes',
  'LGG,AAC,Liège-7,12.50,45.10,3.05,0.00,EUR,54.3,48,Péage Liège nord',
  'AAC,KBL,2.1,0.00,98.75,0.00,1.25,EUR,,,"quai; ""B"""',
  'KBL,LGG,=CMD(),7.00,99.99,0.00,0.00,EUR,190.5,160,',
].join('\n');

describe('semicolon, decimal comma, BOM', () => {
  const first = importNetwork(depots, lanes, {});
  const rfc = lanesCsv(first, findDistinctLoops(first.network!).loops);
  const text = applyCsvDialect(rfc, DECIMAL_COMMA_DIALECT);

  it('starts with the BOM, splits on semicolons and writes decimal commas', () => {
    expect(text.charCodeAt(0)).toBe(0xfeff);
    expect(text).toContain('12,50');
    expect(text).not.toContain('12.50');
    expect(text).toContain('Liège-7');
  });

  it('reads back with the project importer to the same lanes', () => {
    const again = importNetwork(depots, text, {});
    expect(again.report.errors).toEqual([]);
    const a = first.network!;
    const b = again.network!;
    for (const column of ['laneToll', 'laneFuel', 'laneFees', 'laneRebate', 'laneDistanceKm', 'laneDriveMinutes'] as const) expect(Array.from(b[column]), column).toEqual(Array.from(a[column]));
    expect(b.laneRef).toEqual(a.laneRef); // the importer takes the neutralising apostrophe off again
    expect(text).toContain("'=CMD()"); // while in the file the formula stays neutralised
  });

  it('reads back with papaparse as columns, "Liège" intact, refs that look like numbers untouched', () => {
    const parsed = Papa.parse<string[]>(text.slice(1), { delimiter: ';' });
    const [header, ...rows] = parsed.data.filter((r) => r.length > 1);
    const at = (name: string) => header.indexOf(name);
    expect(at('ref')).toBeGreaterThanOrEqual(0);
    const liege = rows.find((r) => r[at('ref')] === 'Liège-7')!;
    expect(liege[at('toll')]).toBe('12,50');
    expect(liege[at('notes')]).toBe('Péage Liège nord');
    expect(rows.some((r) => r[at('ref')] === '2.1')).toBe(true);
    expect(rows.find((r) => r[at('ref')] === '2.1')![at('notes')]).toBe('quai; "B"');
  });

  it('keeps depot names intact in the routes CSV', () => {
    const report = routesReport(first.network!, cheapestRoutes(first.network!, 0));
    const parsed = Papa.parse<string[]>(applyCsvDialect(routesCsv(report), DECIMAL_COMMA_DIALECT).slice(1), { delimiter: ';' });
    expect(parsed.data.some((r) => r.includes('Liège Trilogiport'))).toBe(true);
  });
});

describe('dialect choice', () => {
  it('follows the locale: decimal-comma locales get semicolons and a BOM', () => {
    expect(dialectForLocale('de-DE')).toEqual(DECIMAL_COMMA_DIALECT);
    expect(dialectForLocale('fr-BE')).toEqual(DECIMAL_COMMA_DIALECT);
    expect(dialectForLocale('en-GB')).toEqual(RFC4180_DIALECT);
    expect(dialectForLocale('not a locale!')).toEqual(RFC4180_DIALECT);
  });

  it('reads the command-line names and refuses others', () => {
    expect(parseCsvDialect('semicolon')).toEqual(DECIMAL_COMMA_DIALECT);
    expect(parseCsvDialect('comma')).toEqual(RFC4180_DIALECT);
    expect(parseCsvDialect('comma,comma,bom')).toEqual({ separator: ',', decimalMark: ',', bom: true });
    expect(parseCsvDialect('tab')).toBeNull();
    expect(parseCsvDialect('semicolon,comma')).toBeNull();
  });

  it('leaves RFC 4180 text as it is, and quotes a decimal comma under a comma separator', () => {
    expect(applyCsvDialect('a,b\r\n1.5,x\r\n', RFC4180_DIALECT)).toBe('a,b\r\n1.5,x\r\n');
    expect(formatCsvDialect([['a', 'b'], ['1.5', '-2.25']], { separator: ',', decimalMark: ',', bom: false })).toBe('a,b\r\n"1,5","-2,25"\r\n');
  });
});
