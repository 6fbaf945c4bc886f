// Named error classes shared across the engine. Callers (CLI, main, worker) catch these by class and
// print `message` as one line; tests check the class and its fields, never the wording.

import { escapeControls, shownText } from './text/shown-text';

/** Base of every error the engine raises on purpose. */
export class LanewrightError extends Error {
  constructor(message: string) {
    super(message);
    this.name = new.target.name;
  }
}

/** A text that should hold an amount of money but does not. */
export class MoneyFormatError extends LanewrightError {
  constructor(readonly value: string, readonly reason: string) {
    super(`money: cannot read "${shownText(value)}": ${reason}`);
  }
}

/** A sum of money left the range where integers are exact (Number.MAX_SAFE_INTEGER minor units). */
export class MoneyOverflowError extends LanewrightError {
  constructor(readonly context: string) {
    super(`money: ${context} exceeds ${Number.MAX_SAFE_INTEGER} minor units; refusing to give an inexact figure`);
  }
}

/** A depot id that the network does not contain. */
export class UnknownDepotError extends LanewrightError {
  constructor(readonly depotId: string, readonly context = 'network') {
    super(`${context}: unknown depot "${depotId}"`);
  }
}

/** A network that cannot be built from the given depots and lanes. */
export class NetworkBuildError extends LanewrightError {
  constructor(readonly reason: string) {
    super(`network: ${reason}`);
  }
}

/** Asking for the path to a depot whose cost is unbounded (it would circle a rebate loop forever). */
export class UnboundedPathError extends LanewrightError {
  constructor(readonly depotId: string) {
    super(`routes: depot "${depotId}" is reachable through a rebate loop; its cost is unbounded and it has no cheapest path`);
  }
}

/** Where a problem in an input file is, as one prints it: `file, row 3, column "toll", value "x"` (parts that are null left out). */
export function fileLocationText(file: string, row: number | null, column: string | null, value: string | null): string {
  // Column names and values come from the file: shown escaped and shortened (engine/text/shown-text.ts).
  return [escapeControls(file), row !== null ? `row ${row}` : null, column !== null ? `column "${shownText(column)}"` : null, value !== null ? `value "${shownText(value)}"` : null]
    .filter((part) => part !== null)
    .join(', ');
}

/** A problem in an input file, located as a spreadsheet shows it (header = row 1). */
export class InputFileError extends LanewrightError {
  constructor(
    readonly file: string,
    readonly row: number | null,
    readonly column: string | null,
    readonly value: string | null,
    readonly reason: string,
  ) {
    super(`${fileLocationText(file, row, column, value)}: ${reason}`);
  }
}

/** A scenario document that cannot be read; `path` locates the field (e.g. "changes[2].lane.from"). */
export class ScenarioFormatError extends LanewrightError {
  constructor(
    readonly source: string,
    readonly path: string,
    readonly value: string | null,
    readonly reason: string,
  ) {
    super(`${source}: ${path === '' ? 'document' : `field "${path}"`}${value !== null ? `, value ${value}` : ''}: ${reason}`);
  }
}

/** A computation that needs a loop-free network (Johnson's reweighting, headroom) was given one with a rebate loop. */
export class RebateLoopPresentError extends LanewrightError {
  constructor(readonly depotIds: readonly string[], readonly context: string) {
    super(`${context}: the network has a rebate loop through ${depotIds.join(' > ')}; fix it first (see the audit's fix plan)`);
  }
}

/** A review whose work would pass its budget (e.g. too many periods in a calendar window); the message says how to narrow it. */
export class ReviewBudgetError extends LanewrightError {}
