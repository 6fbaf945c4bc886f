// One editable amount in the lane table. The text is checked with the engine's exact money parser
// when the cell is committed (Enter or leaving it); a bad value stays in the cell, marked invalid,
// and its reason is the input's description (announced once, since a tooltip reaches no screen reader).

import { useId, useState } from 'react';
import { LanewrightError } from '../../../engine/index';
import { parseMinor } from '../../../engine/index';
import { formatMinor, type Minor } from '../../../engine/index';

export interface AmountCellProps {
  valueMinor: number;
  exponent: number;
  label: string;
  changed: boolean;
  onCommit(valueMinor: number): void;
}

export function AmountCell({ valueMinor, exponent, label, changed, onCommit }: AmountCellProps) {
  const shown = formatMinor(valueMinor as Minor, exponent);
  const [draft, setDraft] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const problemId = `${useId()}-problem`;
  const commit = () => {
    if (draft === null) return;
    try {
      const value = parseMinor(draft, exponent);
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
