// `lanewright audit --date D`: the contract review of one day's network, independent of any origin:
// every distinct rebate loop, a verified fix plan and the rebate headroom of every lane, as CSV (one
// row per lane) or JSON; --loops-csv also writes one row per lane of each loop. Without --date the
// command reviews the whole calendar (audit-calendar.ts).
// This file holds the option table and help; the work is in audit-run.ts, imported only when it runs, so
// `--help` never loads the engine.

import { NETWORK_FILES, PLANNING_OPTIONS, JSON_OPTION, OUT_OPTION, TIMINGS_OPTION, LOOP_CAP_OPTION, CSV_DIALECT_OPTION, type CommandSpec } from '../options';

export const auditCommand: CommandSpec = {
  name: 'audit',
  summary: 'contract review: rebate loops, a verified fix plan and rebate headroom, over the whole calendar or one day',
  details:
    'Without --date, reviews the whole calendar: the periods in which the set of valid lanes is the same, each\n' +
    'loop with the date ranges it exists in and the clauses it combines, one fix plan verified on every period\n' +
    '(--fix-by lane or clause) and headroom per lane; --report writes a printable HTML report. With --scenario,\n' +
    'the contract is reviewed as the what-if changes it (amounts, closed and added lanes, validity). With --date,\n' +
    'reviews that day\'s network. Finds the distinct rebate loops (up to --loop-cap), a set of rebate cuts that\n' +
    'removes them all (checked by solving again) and how far each lane\'s rebate can grow before a loop appears.\n' +
    'Prints one CSV row per lane, or one JSON object with --json; --loops-csv also writes one row per lane of each loop.',
  example: 'lanewright audit --depots sample-data/depots.csv --lanes sample-data/lanes.csv --date 2026-06-01 --negotiable K-2',
  options: [
    ...NETWORK_FILES,
    LOOP_CAP_OPTION,
    { name: 'negotiable', value: 'REF,...', help: 'contract references or lane keys (FROM>TO|ref|n) whose rebates may change' },
    { name: 'loops-csv', value: 'FILE', help: 'also write one row per lane of each loop to FILE' },
    { name: 'progress', help: 'print progress by phase on stderr' },
    { name: 'threads', value: 'N', help: 'threads for the headroom searches (default: the processors available to this process; 1 = no worker thread)' },
    { name: 'scenario', value: 'FILE', help: 'review the contract as this what-if scenario file (lanewright-scenario) changes it' },
    { name: 'from-date', value: 'YYYY-MM-DD', help: 'calendar review: first day reviewed (default: the earliest date the file names)' },
    { name: 'to-date', value: 'YYYY-MM-DD', help: 'calendar review: last day reviewed (default: the latest date the file names)' },
    { name: 'fix-by', value: 'lane|clause', help: 'calendar review: one cut per lane (default) or one percentage cut per clause' },
    { name: 'report', value: 'FILE', help: 'calendar review: also write a printable HTML report to FILE' },
    { name: 'fix-scenario-out', value: 'FILE', help: 'calendar review: write the verified fix plan as a scenario file (the --scenario given plus one rebate change per lane)' },
    JSON_OPTION,
    CSV_DIALECT_OPTION,
    OUT_OPTION,
    TIMINGS_OPTION,
    // audit's --date has its own meaning: without it the whole calendar is reviewed, not today.
    ...PLANNING_OPTIONS.map((o) => (o.name === 'date' ? { ...o, help: 'review this one day; without it, audit reviews the whole calendar of the contract' } : o)),
  ],
  load: async () => (await import('./audit-run')).runAudit,
};
