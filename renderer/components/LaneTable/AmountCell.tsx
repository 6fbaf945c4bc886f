// One editable amount in the lane table. The text is read by the importer's rules (the engine's
// readEnteredAmount: "12,50", "1.234,56" and "12.50 EUR" read as in a lanes file) when the cell is
// committed (Enter or leaving it); a bad value stays in the cell, marked invalid, and its reason is
// the input's description (announced once, since a tooltip reaches no screen reader).

import { useId, useState } from 'react';
import { LanewrightError } from '../../../engine/index';
import { readEnteredAmount } from '../../../engine/index';
import { formatMinor, type Minor } from '../../../engine/index';

export interface AmountCellProps {
  /** NaN for a blank cell of the file (e.g. fuel that planning estimates). */
  valueMinor: number;
  exponent: number;
  currency: string;
  label: string;
  changed: boolean;
  onCommit(valueMinor: number): void;
}

export function AmountCell({ valueMinor, exponent, currency, label, changed, onCommit }: AmountCellProps) {
  const shown = Number.isNaN(valueMinor) ? '' : formatMinor(valueMinor as Minor, exponent);
  const [draft, setDraft] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const problemId = `${useId()}-problem`;
  const commit = () => {
    if (draft === null) return;
    try {
      const value = readEnteredAmount(draft, exponent, currency);
      if (value < 0) throw new LanewrightError('amounts are entered as positive numbers; a rebate reduces the cost by itself');
      setDraft(null);
      setProblem(null);
      if (value !== valueMinor) onCommit(value);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    }
  };
  return (
    <>
      <input
        className={`lw-amount${changed ? ' lw-changed' : ''}`}
        inputMode="decimal"
        aria-label={label}
        aria-invalid={problem !== null}
        aria-describedby={problem !== null ? problemId : undefined}
        title={problem ?? (changed ? 'Changed in the scenario' : undefined)}
        value={draft ?? shown}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') {
            setDraft(null);
            setProblem(null);
          }
        }}
      />
      {problem !== null && (
        <span id={problemId} className="lw-visually-hidden" role="alert">
          {problem}
        </span>
      )}
    </>
  );
}
