// The planning settings the command line has as options: fuel price, consumption, driving limit,
// detour factor, average speed, default toll, currency and exchange rates. Each field shows its
// default and where the default comes from; empty = the default. A value is taken on Enter or when
// the field is left, checked by the engine's reader (refused values stay in the field, marked, with
// the reason), and a taken value re-plans like the date or the vehicle class. Saved in the workspace.

import { useEffect, useId, useState } from 'react';
import { EMPTY_PLANNING_CHOICES, PLANNING_CHOICE_DEFAULTS, PLANNING_CHOICE_FIELDS, readPlanningChoices, type PlanningChoices } from '../../../engine/index';

const LABELS: Record<keyof PlanningChoices, { label: string; hint: string }> = {
  fuelPrice: { label: 'Fuel price per litre', hint: 'e.g. 1.719, in the network currency' },
  fuelConsumption: { label: 'Fuel use (l/100 km)', hint: 'e.g. 30' },
  drivingLimit: { label: 'Daily driving limit', hint: 'eu, us or hours, e.g. 10' },
  detourFactor: { label: 'Detour factor', hint: 'road km / straight-line km, e.g. 1.25' },
  averageSpeed: { label: 'Average speed (km/h)', hint: 'e.g. 70' },
  defaultToll: { label: 'Default toll', hint: 'for lanes without one for the class, e.g. 12.00' },
  currency: { label: 'Network currency', hint: 'ISO 4217, e.g. EUR' },
  exchangeRates: { label: 'Exchange rates', hint: 'CODE=RATE,... e.g. USD=0.92' },
};

export interface PlanningSettingsProps {
  choices: PlanningChoices | undefined;
  onChange(next: PlanningChoices): void;
}

export function PlanningSettings({ choices, onChange }: PlanningSettingsProps) {
  const id = useId();
  const taken = choices ?? EMPTY_PLANNING_CHOICES;
  const [draft, setDraft] = useState<PlanningChoices>(taken);
  const [problems, setProblems] = useState<Partial<Record<keyof PlanningChoices, string>>>({});
  // A workspace opened elsewhere replaces the values; fields follow.
  useEffect(() => setDraft(taken), [taken]);
  const changed = PLANNING_CHOICE_FIELDS.filter((f) => taken[f] !== null).length;

  const take = (field: keyof PlanningChoices) => {
    const text = draft[field]?.trim() ?? '';
    const value = text === '' ? null : text;
    const problem = readPlanningChoices({ ...EMPTY_PLANNING_CHOICES, [field]: value }).problems[0];
    setProblems((p) => ({ ...p, [field]: problem?.reason }));
    if (problem || value === taken[field]) return;
    onChange({ ...taken, [field]: value });
  };

  return (
    <details className="lw-planning" data-testid="planning-settings">
      <summary>
        Planning settings{changed > 0 ? ` (${changed} changed)` : ' (defaults)'}
      </summary>
      <p className="lw-muted">Empty = the default shown under the field. A change re-plans.</p>
      {PLANNING_CHOICE_FIELDS.map((field) => {
        const input = `${id}-${field}`;
        const problem = problems[field];
        return (
          <div key={field} className="lw-setting">
            <label htmlFor={input}>{LABELS[field].label}</label>
            <input
              id={input}
              type="text"
              inputMode={field === 'drivingLimit' || field === 'currency' || field === 'exchangeRates' ? 'text' : 'decimal'}
              placeholder={PLANNING_CHOICE_DEFAULTS[field].value}
              value={draft[field] ?? ''}
              aria-invalid={problem ? true : undefined}
              aria-describedby={`${input}-default${problem ? ` ${input}-problem` : ''}`}
              onChange={(e) => setDraft({ ...draft, [field]: e.target.value })}
              onBlur={() => take(field)}
              onKeyDown={(e) => {
                if (e.key === 'Enter') take(field);
              }}
            />
            {problem && (
              <span id={`${input}-problem`} className="lw-warn" role="alert">
                {LABELS[field].label}: {problem}
              </span>
            )}
            <span id={`${input}-default`} className="lw-setting-default">
              Default {PLANNING_CHOICE_DEFAULTS[field].value} ({LABELS[field].hint}). Source: {PLANNING_CHOICE_DEFAULTS[field].source}
            </span>
          </div>
        );
      })}
    </details>
  );
}
