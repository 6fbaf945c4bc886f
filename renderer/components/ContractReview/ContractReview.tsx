// The contract-review view, under the active scenario: the whole calendar (CalendarReview) and the
// one-day review of the planned date — every rebate loop of that day with the lanes and references
// that form it, a fix plan (which rebates to cut, and by how much) that can be tried as a scenario,
// and rebate headroom per lane.

import { CautionLine } from '../CautionLine/CautionLine';
import { useEffect, useState } from 'react';
import { WorkCancelledError, type Engine } from '../../app/use-engine';
import { formatMoney, formatMoneyWithCode, formatMs } from '../../model/format';
import { fixPlanScenario, withChanges, type Scenario } from '../../model/scenario-edits';
import type { NetworkView } from '../../worker/protocol';
import type { ContractReviewView } from '../../worker/protocol';
import type { HeadroomThreadsView } from '../../worker/headroom-protocol';
import type { LanewrightHost } from '../../../main/ipc/contract';
import { CalendarReview } from './CalendarReview';
import { FixPlanTable, HeadroomTable, LoopLanes, ReviewExports } from './ReviewTables';
import { laneKey } from '../../model/lane-names';
import { counted, plural } from '../../../engine/index';

export interface ContractReviewProps {
  /** Sets the dispatch date (from the calendar strip), and the vehicle class when given (null = as priced in the lanes file). */
  onDate(date: string, vehicleClass?: string | null): void;
  engine: Engine;
  network: NetworkView;
  scenario: Scenario;
  onScenario(next: Scenario): void;
  host: LanewrightHost;
  onMessage(text: string): void;
  /** Exports the review on screen as CSV (the worker keeps the review it last made). */
  onExport(kind: 'review-csv' | 'calendar-review-csv'): void;
}

export function ContractReview({ engine, network, scenario, onScenario, host, onMessage, onDate, onExport }: ContractReviewProps) {
  const [fixBy, setFixBy] = useState<'lane' | 'clause'>('lane');
  const [review, setReview] = useState<ContractReviewView | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  // A cancelled review is not a problem of the contract: it says so and can be run again.
  const [stopped, setStopped] = useState(false);
  const [attempt, setAttempt] = useState(0);
  useEffect(() => {
    let live = true;
    setReview(null);
    setProblem(null);
    setStopped(false);
    engine
      .track((onProgress) => engine.client.request('review', { scenario, fixBy }, onProgress), 'Reviewing the contract')
      .then((answer) => live && setReview(answer.review))
      .catch((error: Error) => live && (error instanceof WorkCancelledError ? setStopped(true) : setProblem(error.message)));
    return () => {
      live = false;
    };
  }, [engine, network, scenario, attempt, fixBy]);
  if (stopped) {
    return (
      <p>
        The contract review was stopped.{' '}
        <button type="button" onClick={() => setAttempt((n) => n + 1)}>
          Review again
        </button>
      </p>
    );
  }
  if (problem) return <p className="lw-warn">{problem}</p>;
  if (!review) return <p aria-busy="true">Reviewing the contract…</p>;
  const money = (v: number) => formatMoney(v, network.exponent);
  const saveReport = async () => {
    if (!review.calendarHtml || !review.calendar) return;
    const window = review.calendar.window;
    const saved = await host.saveExport(`contract-review-${window.from ?? 'undated'}-${window.to ?? ''}.html`.replace('-.html', '.html'), review.calendarHtml, 'html');
    if (!saved.ok) onMessage(`Report not saved: ${saved.failure.message}`);
    else if (saved.value) onMessage(`Saved the contract review report: ${saved.value.path}`);
  };
  // A loop bar of the strip plans its first day for a class the loop holds for: the planned class
  // when it is one of them, else the first, and says so (a loop of the 2-axle tolls is not in a plan
  // of the 5-axle ones).
  const showRange = (date: string, classes: readonly (string | null)[] | null) => {
    if (classes === null || classes.length === 0 || classes.includes(network.plannedClass)) return onDate(date);
    onDate(date, classes[0]);
    onMessage(`Planning ${date} for vehicle class ${classes[0] ?? 'as priced in the lanes file'}: the loop exists for ${classes.map((c) => c ?? 'the toll column').join(', ')}.`);
  };
  // The calendar plan's changes go into the active scenario, where the user sees, undoes and saves them.
  const applyCalendarFix = () => {
    const changes = review.calendarFix;
    onScenario(withChanges(scenario, changes));
    onMessage(`Applied the calendar fix plan (by ${fixBy}) to the scenario “${scenario.name}”: ${changes.length} rebate change(s); undo or save them under Lanes & scenario.`);
  };
  // "Whole contract" is said only of the calendar review; the one-day review names its date.
  const day = network.plan.date ? `on ${network.plan.date}` : 'with every row valid at once (no date chosen)';
  return (
    <div className="lw-review" data-testid="contract-review">
      <CautionLine kind="review" testId="review-caution" />
      <ReviewExports calendar={review.calendar !== null} onExport={onExport} />
      {review.calendar && (
        <CalendarReview
          calendar={review.calendar}
          exponent={network.exponent}
          fixBy={fixBy}
          onFixBy={setFixBy}
          onSaveReport={() => void saveReport()}
          onDate={showRange}
          onApplyFix={review.calendarFix.length > 0 ? applyCalendarFix : null}
        />
      )}
      {review.scenarioProblems.length > 0 && <p className="lw-warn">Scenario changes not applied: {review.scenarioProblems.join('; ')}</p>}
      <h3>
        One-day review: rebate loops {day}{scenario.changes.length > 0 ? ` (scenario “${scenario.name}”)` : ''}: {review.loops.length}
        {review.loop_cap_reached ? ' (list incomplete)' : ''}
      </h3>
      {review.loop_search_note !== null && <p className="lw-warn">Loop search: {review.loop_search_note}.</p>}
      {review.loops.length === 0 && (
        <p>
          No loop of lanes has a negative net cost {day}: every cheapest route is well defined
          {review.calendar && review.calendar.loops.length > 0 ? ` that day, but the contract has ${counted(review.calendar.loops.length, 'loop')} on other dates (above)` : ''}.
        </p>
      )}
      {review.loops.map((loop, i) => (
        <section key={i} className="lw-review-loop" aria-label={`Loop ${i + 1}`}>
          <h4>
            ⚠ Loop {i + 1}: {loop.depots.join(' → ')} → {loop.depots[0]} · net per lap {formatMoneyWithCode(loop.net_per_lap_minor, review.currency, network.exponent)} · makes {counted(loop.unbounded_depots.length, 'depot')} unbounded
          </h4>
          <LoopLanes loop={loop} money={money} />
        </section>
      ))}
      {review.fix_plan.length > 0 && (
        <section aria-label="Fix plan">
          <h3>Fix plan: cut {counted(review.fix_plan.length, 'rebate')}{review.fix_plan_verified ? ' (checked: no loop remains)' : ' (not verified)'}</h3>
          <FixPlanTable rows={review.fix_plan} money={money} />
          <button type="button" onClick={() => onScenario(fixPlanScenario(scenario, network, (e) => laneKey(network, e), review.fix_plan, (row) => `one-day fix plan ${day} (vehicle class ${network.plan.vehicleClass ?? 'as priced in the lanes file'}): lanes-file row ${row}; the rebate holds for every vehicle class`))}>
            Try the fix plan as a scenario
          </button>
        </section>
      )}
      {review.unfixable_loops.length > 0 && <p className="lw-warn">{counted(review.unfixable_loops.length, 'loop')} {plural(review.unfixable_loops.length, 'carries', 'carry')} no rebate at all; no rebate cut fixes them — check the amounts on their lanes.</p>}
      <section aria-label="Rebate headroom">
        <h3>Rebate headroom per lane{review.headroom_after_fix_plan ? ' (after the fix plan)' : ''}</h3>
        <p className="lw-muted">Floor: the lowest net a lane can have before some loop of lanes pays for itself. Headroom: net minus floor, how much more rebate the lane could carry.</p>
        <HeadroomThreads threads={review.headroomThreads} />
        {review.headroom.length > 0 ? <HeadroomTable rows={review.headroom} exponent={network.exponent} /> : <p>Not available while a loop has no fix.</p>}
      </section>
    </div>
  );
}

/** The review's figures on its headroom searches: how many ran, and on how many threads (and why one, when so). */
function HeadroomThreads({ threads }: { threads: HeadroomThreadsView }) {
  if (threads.runs === 0) return null;
  return (
    <p className="lw-muted" data-testid="review-threads" data-threads={threads.used} data-available={threads.available} data-pairs={threads.pairs} data-ms={threads.ms}>
      Headroom {plural(threads.runs, 'search', 'searches')}: {counted(threads.runs, 'network')}, {threads.pairs.toLocaleString('en')} lane {plural(threads.pairs, 'pair')} in {formatMs(threads.ms)}; threads used: {threads.used} of {threads.available}
      {threads.oneThreadBecause !== null ? ` (one thread: ${threads.oneThreadBecause})` : ''}.
    </p>
  );
}
