// The printable contract review: one self-contained HTML file (no script, no external resource,
// print styles) an analyst can attach to an email or print. Every text from the files is escaped;
// the calendar strip reads without colour (hatching and the loop's number in each cell).

import { formatMinor, type Minor } from '../money/minor';
import type { CalendarReport, DateRange } from './calendar-report';
import { counted } from '../text/plural';

export interface ReviewedFile {
  /** File name as the user gave it. */
  name: string;
  /** SHA-256 of the file's bytes, hex. */
  sha256: string;
}

export interface CalendarHtmlOptions {
  files: readonly ReviewedFile[];
  exponent: number;
  /** When the report was made (ISO 8601), given by the caller: the engine keeps no clock. */
  madeAt?: string;
  /** Most headroom rows listed (default 500); the report says when more exist. */
  maxHeadroomRows?: number;
}

/** Text as HTML text content: & < > " ' escaped. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

const STYLE = `
body{font:10pt/1.35 system-ui,sans-serif;margin:1.5em;color:#000}
h1{font-size:15pt;margin:0 0 .3em}h2{font-size:12pt;margin:1.2em 0 .4em;border-bottom:1px solid #000}
h3{font-size:10.5pt;margin:.8em 0 .3em}
table{border-collapse:collapse;margin:.3em 0 .8em;width:auto}th,td{border:1px solid #777;padding:2px 5px;text-align:left;vertical-align:top}
th{background:#eee}td.num{text-align:right;font-variant-numeric:tabular-nums}
.caution{border:2px solid #000;padding:.5em .8em;margin:.6em 0}
.strip{width:100%;table-layout:fixed}.strip td,.strip th{font-size:7.5pt;padding:1px 2px;overflow:hidden;white-space:nowrap}
.strip td.on{background:repeating-linear-gradient(45deg,#000 0 1.5px,#fff 1.5px 5px);font-weight:bold}
.strip td.on span{background:#fff;padding:0 2px}
.note{color:#333}
@media print{body{margin:0}h2{break-after:avoid}table,.caution{break-inside:avoid}
*{-webkit-print-color-adjust:exact;print-color-adjust:exact}@page{size:A4 landscape;margin:12mm}}`;

/** The report as one HTML document. */
export function calendarReviewHtml(report: CalendarReport, options: CalendarHtmlOptions): string {
  const e = escapeHtml;
  const money = (v: number | null) => (v === null ? 'no limit' : `${formatMinor(v as Minor, options.exponent)}`);
  const range = (r: DateRange | null) => (r === null ? '' : r.from === null ? 'every date (undated)' : `${r.from} to ${r.to}`);
  const cls = (c: string | null) => (c === null ? 'default toll' : c);
  const table = (head: string[], rows: (string | number)[][], numeric: number[] = []) =>
    `<table><thead><tr>${head.map((h) => `<th>${e(h)}</th>`).join('')}</tr></thead><tbody>${rows
      .map((r) => `<tr>${r.map((c, i) => `<td${numeric.includes(i) ? ' class="num"' : ''}>${e(String(c))}</td>`).join('')}</tr>`)
      .join('')}</tbody></table>`;
  const parts: string[] = [];

  parts.push(`<h1>Contract review across the calendar</h1>`);
  parts.push(`<p>Window reviewed: <b>${e(range(report.window))}</b>, ${counted(report.periods.length, 'period')} in which the valid lane rows do not change; vehicle classes: ${e(report.classes.map(cls).join(', '))}. Amounts in ${e(report.currency)}.${options.madeAt ? ` Made ${e(options.madeAt)}.` : ''}</p>`);
  if (report.scenario) {
    const sc = report.scenario;
    parts.push(`<p><b>Under the what-if scenario “${e(sc.name)}”</b>: every figure below is the contract as these changes make it, not the files as loaded.</p>`);
    parts.push(table(['change', 'note', 'applied'], sc.changes.map((c) => [c.text, c.note ?? '', c.applied ? 'yes' : `no: ${c.problem ?? ''}`])));
    if (sc.plan_problems.length > 0) parts.push(`<p class="note">Rows left out of some period: ${e(sc.plan_problems.join('; '))}</p>`);
  }
  parts.push(`<div class="caution"><b>Caution.</b> ${e(report.caution)}</div>`);
  parts.push(`<h2>Files reviewed</h2>` + table(['file', 'SHA-256'], options.files.map((f) => [f.name, f.sha256])));

  parts.push(`<h2>When each loop exists</h2>`);
  if (report.loops.length === 0) parts.push(`<p>No rebate loop in any period of the window, for any vehicle class.</p>`);
  else parts.push(strip(report, e));

  parts.push(`<h2>Loops (${report.loops.length}${report.loop_cap_reached ? ', more exist beyond the cap' : ''})</h2>`);
  for (const loop of report.loops) {
    parts.push(`<h3>Loop ${loop.id}: ${e([...loop.depots, loop.depots[0]].join(' > '))}</h3>`);
    parts.push(`<p>Clauses combined: <b>${e(loop.clauses.join(', ') || 'none')}</b>. Vehicle classes: ${e(loop.classes.map(cls).join(', '))}.</p>`);
    parts.push(table(['from', 'to', 'vehicle class', 'net per lap'], loop.ranges.flatMap((r) => r.by_class.map((c) => [r.from ?? '', r.to ?? '', cls(c.vehicle_class), money(c.net_per_lap_minor)])), [3]));
    parts.push(table(['row', 'from', 'to', 'ref', 'clause', 'rebate'], loop.lane_details.map((l) => [l.row, l.from, l.to, l.ref ?? '', l.clause, money(l.rebate_minor)]), [0, 5]));
  }

  parts.push(`<h2>Fix plan for the whole calendar (by ${e(report.fix_by)})</h2>`);
  if (report.loops.length === 0) parts.push(`<p>Nothing to fix.</p>`);
  else {
    parts.push(
      `<p>${report.fix_plan_verified ? 'Verified: every period network of every class was solved again with these cuts and has no loop; no rebate goes below zero and no lane gets cheaper.' : '<b>Not verified: loops remain after this plan.</b>'} Rebate removed per year of validity: ${e(money(report.rebate_removed_per_year_minor))}.</p>`,
    );
    if (report.fix_plan_method) parts.push(`<p class="note">Method: ${e(report.fix_plan_method)}.</p>`);
    parts.push(
      table(
        ['row', 'from', 'to', 'ref', 'clause', 'cut %', 'rebate', 'new rebate', 'cut', 'net', 'new net'],
        report.fix_plan.map((f) => [f.row, f.from, f.to, f.ref ?? '', f.clause, f.clause_percent ?? '', money(f.rebate_minor), money(f.new_rebate_minor), money(f.cut_minor), money(f.net_minor), money(f.new_net_minor)]),
        [0, 5, 6, 7, 8, 9, 10],
      ),
    );
  }

  parts.push(`<h2>Clauses</h2>`);
  parts.push(
    table(
      ['clause', 'lane rows', 'total rebate', 'loops', 'on a loop'],
      report.clauses.map((c) => [c.clause + (c.source === 'clause' ? '' : ` (${c.source})`), c.lanes.join(' '), money(c.rebate_minor), c.loops.join(' '), c.ranges.map(range).join('; ')]),
      [2],
    ),
  );

  const negotiable = report.headroom.filter((h) => h.negotiable);
  const withRebate = new Set(report.clauses.filter((c) => c.rebate_minor > 0).flatMap((c) => c.lanes));
  const shown = negotiable.length > 0 ? negotiable : report.headroom.filter((h) => withRebate.has(h.row));
  const cap = options.maxHeadroomRows ?? 500;
  parts.push(`<h2>Headroom ${negotiable.length > 0 ? 'of the negotiable lanes' : 'of the lanes with a rebate (no lane was marked negotiable)'}</h2>`);
  parts.push(`<p class="note">Floor: the lowest net the lane can carry in every period it is valid in without making a loop${report.headroom_after_fix_plan ? ', after the fix plan' : ''}; the period named sets it.</p>`);
  parts.push(
    table(
      ['row', 'from', 'to', 'ref', 'clause', 'vehicle class', 'net', 'floor', 'headroom', 'set by'],
      shown.slice(0, cap).map((h) => [h.row, h.from, h.to, h.ref ?? '', h.clause, cls(h.vehicle_class), money(h.net_minor), money(h.floor_minor), money(h.headroom_minor), range(h.set_by)]),
      [0, 6, 7, 8],
    ),
  );
  if (shown.length > cap) parts.push(`<p class="note">${counted(shown.length - cap, 'more row')} not listed here; the JSON output has them all.</p>`);
  parts.push(`<div class="caution"><b>Caution.</b> ${e(report.caution)}</div>`);

  return `<!DOCTYPE html><html lang="en"><head><meta charset="utf-8"><meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'"><title>Contract review ${e(range(report.window))}</title><style>${STYLE}</style></head><body>${parts.join('\n')}</body></html>\n`;
}

// Periods as columns (width by days), one row per loop: a hatched cell with the loop's number where it exists.
function strip(report: CalendarReport, e: (s: string) => string): string {
  const days = report.periods.map((p) => (p.from === null ? 1 : Math.max(1, (Date.parse(p.to!) - Date.parse(p.from)) / 86_400_000 + 1)));
  const total = days.reduce((a, b) => a + b, 0);
  const cols = `<colgroup><col style="width:7%">${days.map((d) => `<col style="width:${((93 * d) / total).toFixed(3)}%">`).join('')}</colgroup>`;
  // The year is shown where it changes (and first), the month and day everywhere.
  const label = (p: CalendarReport['periods'][number], k: number) =>
    p.from === null ? 'undated' : k === 0 || report.periods[k - 1].from!.slice(0, 4) !== p.from.slice(0, 4) ? p.from : p.from.slice(5);
  const head = `<tr><th>period</th>${report.periods.map((p, k) => `<th title="${e(`${p.from ?? ''} to ${p.to ?? ''}`)}">${e(label(p, k))}</th>`).join('')}</tr>`;
  const rows = report.loops
    .map((loop) => `<tr><th>loop ${loop.id}</th>${report.periods.map((p) => (p.loops.includes(loop.id) ? `<td class="on"><span>${loop.id}</span></td>` : '<td></td>')).join('')}</tr>`)
    .join('');
  return `<table class="strip">${cols}<thead>${head}</thead><tbody>${rows}</tbody></table><p class="note">Columns are periods (start date shown, width by days); a hatched cell numbered n: loop n exists in that period.</p>`;
}
