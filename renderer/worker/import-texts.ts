// Turns the two CSV texts into an import result and the UI's report, and re-plans an import for
// another day or vehicle class. The one place the worker reaches the engine's importer.

import { importNetwork, planNetwork, readPlanningChoices, EMPTY_PLANNING_CHOICES } from '../../engine/index';
import type { ImportResult, ValidationItem } from '../../engine/index';
import type { ImportIssue, ImportReport, NamedText, PlanChoice } from './protocol';

function issue(item: ValidationItem): ImportIssue {
  return { file: item.file, row: item.row, column: item.column, value: item.value, reason: item.message, code: item.code };
}

/** The UI's report of an import result. */
export function reportOf(result: ImportResult): ImportReport {
  const r = result.report;
  return {
    files: r.files.map((f) => ({ ...f })),
    issues: r.errors.map(issue),
    warnings: r.warnings.map(issue),
    omitted: r.omitted,
    excluded: result.plan.excluded,
    notes: [...result.notes, ...result.plan.notes.filter((n) => !result.notes.includes(n))],
    fatal: result.network === null,
  };
}

// Choices the settings panel could not use were marked there; here they fall back to the defaults.
function request(plan: PlanChoice) {
  return { date: plan.date || undefined, vehicleClass: plan.vehicleClass || undefined, settings: readPlanningChoices(plan.planning ?? EMPTY_PLANNING_CHOICES).settings };
}

/** Currency and exchange rates are read with the files: changing them means reading the files again. */
export function currencyKey(plan: PlanChoice): string {
  const read = readPlanningChoices(plan.planning ?? EMPTY_PLANNING_CHOICES);
  return JSON.stringify([read.currency ?? null, read.exchangeRates ? Object.entries(read.exchangeRates).sort() : null]);
}

/**
 * Reads both files. The network is always built from the accepted rows (skipInvalid), so the UI
 * can offer "continue with the accepted rows"; whether to use it is the caller's choice.
 */
export function importTexts(depots: NamedText, lanes: NamedText, plan: PlanChoice, onProgress?: (phase: string, fraction: number) => void): ImportResult {
  const read = readPlanningChoices(plan.planning ?? EMPTY_PLANNING_CHOICES);
  return importNetwork(depots.text, lanes.text, {
    currency: read.currency,
    exchangeRates: read.exchangeRates,
    depotsFile: depots.name,
    lanesFile: lanes.name,
    plan: request(plan),
    skipInvalid: true,
    onProgress: (p) => onProgress?.(`Reading ${p.file === 'depots' ? depots.name : lanes.name}`, (p.file === 'depots' ? 0 : 0.3) + 0.6 * (p.fraction ?? 0.5) * (p.file === 'depots' ? 0.5 : 1)),
  });
}

/** The same import planned for another day or vehicle class. */
export function replanImport(result: ImportResult, plan: PlanChoice): ImportResult {
  return planNetwork(result, request(plan), { skipInvalid: true });
}
