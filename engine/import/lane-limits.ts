// The optional lane limit columns (height, width, length, weight, axle load, ADR tunnel category,
// no dangerous goods), declared once: headers.ts takes its header names from here, the lanes reader
// calls `LaneLimitsBuilder.read` per row, and dispatch reads the finished `LaneLimits` columns.

import { readTunnelCategory, TUNNEL_CATEGORIES } from './adr-tunnels';
import { cellText } from './cells';
import { readNumber } from './decimal-text';
import type { IssueCode } from './types';

export type LaneLimitField = 'max_height' | 'max_width' | 'max_length' | 'max_weight' | 'max_axle_load' | 'tunnel_category' | 'no_dangerous_goods';

/** A limit column: its canonical header, the unit it must be in, and the header synonyms. */
export interface LaneLimitColumn {
  field: LaneLimitField;
  /** Canonical header, as messages and exports name it. */
  name: string;
  kind: 'measure' | 'tunnel-category' | 'yes-no';
  unit: 'm' | 't' | null;
  synonyms: readonly string[];
}

export const LANE_LIMIT_COLUMNS: readonly LaneLimitColumn[] = [
  { field: 'max_height', name: 'max_height_m', kind: 'measure', unit: 'm', synonyms: ['max_height', 'height_limit', 'clearance', 'max_clearance'] },
  { field: 'max_width', name: 'max_width_m', kind: 'measure', unit: 'm', synonyms: ['max_width', 'width_limit'] },
  { field: 'max_length', name: 'max_length_m', kind: 'measure', unit: 'm', synonyms: ['max_length', 'length_limit'] },
  { field: 'max_weight', name: 'max_weight_t', kind: 'measure', unit: 't', synonyms: ['max_weight', 'weight_limit', 'max_gross_weight', 'max_gross_weight_t'] },
  { field: 'max_axle_load', name: 'max_axle_load_t', kind: 'measure', unit: 't', synonyms: ['max_axle_load', 'axle_load_limit', 'max_axle_weight', 'max_axle_weight_t'] },
  { field: 'tunnel_category', name: 'tunnel_category', kind: 'tunnel-category', unit: null, synonyms: ['adr_tunnel_category', 'tunnel_cat', 'tunnel'] },
  { field: 'no_dangerous_goods', name: 'no_dangerous_goods', kind: 'yes-no', unit: null, synonyms: ['no_dg', 'no_adr', 'dangerous_goods_banned'] },
];

/** Header key -> "field" or "field:unit", merged into the lane header names. */
export const LANE_LIMIT_HEADER_NAMES: Readonly<Record<string, string>> = Object.fromEntries(
  LANE_LIMIT_COLUMNS.flatMap((c) => [[c.name, c.unit ? `${c.field}:${c.unit}` : c.field], ...c.synonyms.map((s) => [s, c.field])]),
);

/** Finished limit columns, one entry per lane table row. Only the columns the file has are present. */
export interface LaneLimits {
  /** Measures: NaN = no limit on that lane. */
  measures: { column: LaneLimitColumn; header: string; values: Float64Array }[];
  /** 0 = no tunnel, 1..5 = A..E. */
  tunnelCategory: Uint8Array | null;
  /** 1 = dangerous goods banned on the lane. */
  noDangerousGoods: Uint8Array | null;
  /** Header texts as the file writes them, by field. */
  headers: Partial<Record<LaneLimitField, string>>;
}

type Fail = (column: string, value: string, code: IssueCode, message: string) => void;

const YES = new Set(['yes', 'y', 'true', '1', 'x']);
const NO = new Set(['no', 'n', 'false', '0', '']);

// A growable typed column: doubles when full, trimmed by `build`.
class Column<T extends Float64Array | Uint8Array> {
  values: T;
  count = 0;
  constructor(private readonly make: (n: number) => T) {
    this.values = make(1024);
  }
  push(v: number): void {
    if (this.count === this.values.length) {
      const next = this.make(this.values.length * 2);
      next.set(this.values);
      this.values = next;
    }
    this.values[this.count++] = v;
  }
  done(): T {
    return this.values.slice(0, this.count) as T;
  }
}
const floats = (n: number) => new Float64Array(n);
const bytes = (n: number) => new Uint8Array(n);

/** Reads the limit cells of each row; kept apart from the lanes reader so its rewrite stays easy. */
export class LaneLimitsBuilder {
  private readonly measures: { column: LaneLimitColumn; header: string; index: number; values: Column<Float64Array> }[] = [];
  private tunnel: { header: string; index: number; values: Column<Uint8Array> } | null = null;
  private noDg: { header: string; index: number; values: Column<Uint8Array> } | null = null;
  private rowMeasures = new Float64Array(LANE_LIMIT_COLUMNS.length);
  private rowTunnel = 0;
  private rowNoDg = 0;

  /** Null when the header has no limit column. `columns` maps a field to its column index and header. */
  static forHeader(columns: ReadonlyMap<string, { index: number; header: string; unit: string | null }>, headerProblem: (header: string, unit: string, message: string) => void): LaneLimitsBuilder | null {
    const b = new LaneLimitsBuilder();
    for (const def of LANE_LIMIT_COLUMNS) {
      const col = columns.get(def.field);
      if (!col) continue;
      if (def.unit && col.unit !== null && col.unit !== def.unit) headerProblem(col.header, col.unit, `${def.name} must be in ${def.unit === 'm' ? 'metres (m)' : 'tonnes (t)'}`);
      if (def.kind === 'measure') b.measures.push({ column: def, header: col.header, index: col.index, values: new Column(floats) });
      else if (def.kind === 'tunnel-category') b.tunnel = { header: col.header, index: col.index, values: new Column(bytes) };
      else b.noDg = { header: col.header, index: col.index, values: new Column(bytes) };
    }
    return b.measures.length > 0 || b.tunnel || b.noDg ? b : null;
  }

  /** Checks one row's limit cells; false when one is refused (reported through `fail`). */
  read(cells: readonly string[], decimalComma: boolean, fail: Fail): boolean {
    let ok = true;
    for (let k = 0; k < this.measures.length; k++) {
      const m = this.measures[k];
      const text = cellText(cells, m.index);
      let value = NaN;
      if (text !== '') {
        const r = readNumber(text, { decimalComma, allowGrouping: false });
        if (!r.ok) {
          fail(m.header, text, r.code, r.reason);
          ok = false;
        } else if (!(r.value > 0)) {
          fail(m.header, text, 'not-positive', `${m.column.name} must be a positive number of ${m.column.unit === 'm' ? 'metres' : 'tonnes'}`);
          ok = false;
        } else value = r.value;
      }
      this.rowMeasures[k] = value;
    }
    this.rowTunnel = 0;
    if (this.tunnel) {
      const text = cellText(cells, this.tunnel.index);
      if (text !== '' && text !== '-') {
        const c = readTunnelCategory(text);
        if (c === null) {
          fail(this.tunnel.header, text, 'bad-tunnel-category', 'tunnel category must be A, B, C, D or E (UNECE ADR 1.9.5), or blank for no tunnel');
          ok = false;
        } else this.rowTunnel = TUNNEL_CATEGORIES.indexOf(c) + 1;
      }
    }
    this.rowNoDg = 0;
    if (this.noDg) {
      const text = cellText(cells, this.noDg.index).toLowerCase();
      if (YES.has(text)) this.rowNoDg = 1;
      else if (!NO.has(text)) {
        fail(this.noDg.header, cellText(cells, this.noDg.index), 'bad-yes-no', 'no_dangerous_goods must be yes or no (blank = no)');
        ok = false;
      }
    }
    return ok;
  }

  /** Keeps the values last read; call once per accepted row, in row order. */
  keep(): void {
    for (let k = 0; k < this.measures.length; k++) this.measures[k].values.push(this.rowMeasures[k]);
    this.tunnel?.values.push(this.rowTunnel);
    this.noDg?.values.push(this.rowNoDg);
  }

  build(): LaneLimits {
    const headers: LaneLimits['headers'] = {};
    for (const m of this.measures) headers[m.column.field] = m.header;
    if (this.tunnel) headers.tunnel_category = this.tunnel.header;
    if (this.noDg) headers.no_dangerous_goods = this.noDg.header;
    return {
      measures: this.measures.map((m) => ({ column: m.column, header: m.header, values: m.values.done() })),
      tunnelCategory: this.tunnel ? this.tunnel.values.done() : null,
      noDangerousGoods: this.noDg ? this.noDg.values.done() : null,
      headers,
    };
  }
}
