// The planning controls: origin, dispatch date, vehicle class and the leg limit. Every change
// recomputes the plan in the worker (debounced by the plan hook).

import { useEffect, useId, useState } from 'react';
import type { NetworkView, PlanSettings } from '../../worker/protocol';
import { OriginPicker } from '../OriginPicker/OriginPicker';

export interface PlanControlsProps {
  network: NetworkView;
  settings: PlanSettings;
  onChange(next: PlanSettings): void;
}

export function PlanControls({ network, settings, onChange }: PlanControlsProps) {
  const id = useId();
  const set = (patch: Partial<PlanSettings>) => onChange({ ...settings, ...patch });
  // The leg limit as typed: a value that is not a whole number from 1 stays in the field, marked,
  // with the reason (it used to be dropped silently, leaving the old limit in force).
  const [legsText, setLegsText] = useState(settings.maxLegs === null ? '' : String(settings.maxLegs));
  const [legsProblem, setLegsProblem] = useState<string | null>(null);
  useEffect(() => {
    setLegsText(settings.maxLegs === null ? '' : String(settings.maxLegs));
    setLegsProblem(null);
  }, [settings.maxLegs]);
  return (
    <fieldset className="lw-controls">
      <legend>Plan</legend>
      <OriginPicker ids={network.depotIds} names={network.depotNames} value={settings.origin} onChange={(origin) => set({ origin })} />
      <div className="lw-field">
        <label htmlFor={`${id}-date`}>Dispatch date</label>
        <input id={`${id}-date`} type="date" value={settings.dispatchDate} onChange={(e) => e.target.value && set({ dispatchDate: e.target.value })} />
      </div>
      <div className="lw-field">
        <label htmlFor={`${id}-class`}>Vehicle class</label>
        <select id={`${id}-class`} value={settings.vehicleClass} onChange={(e) => set({ vehicleClass: e.target.value })}>
          <option value="">As priced in the lanes file</option>
          {network.vehicleClasses.map((c) => (
            <option key={c} value={c}>
              {c}
            </option>
          ))}
        </select>
      </div>
      <div className="lw-field lw-legs">
        <label htmlFor={`${id}-legs`}>Maximum legs</label>
        <input
          id={`${id}-legs`}
          type="number"
          min={1}
          step={1}
          placeholder="no limit"
          aria-describedby={`${id}-legs-help${legsProblem ? ` ${id}-legs-problem` : ''}`}
          aria-invalid={legsProblem ? true : undefined}
          value={legsText}
          onChange={(e) => {
            const raw = e.target.value.trim();
            setLegsText(e.target.value);
            if (raw === '') {
              setLegsProblem(null);
              set({ maxLegs: null });
            } else if (/^\d+$/.test(raw) && Number(raw) >= 1) {
              setLegsProblem(null);
              set({ maxLegs: Number(raw) });
            } else {
              setLegsProblem(`"${raw}" is not a whole number from 1; the limit stays ${settings.maxLegs ?? 'off'}.`);
            }
          }}
        />
        <span id={`${id}-legs-help`} className="lw-muted">
          Empty = no limit
        </span>
        {legsProblem && (
          <span id={`${id}-legs-problem`} className="lw-warn" role="alert">
            Maximum legs: {legsProblem}
          </span>
        )}
      </div>
    </fieldset>
  );
}
