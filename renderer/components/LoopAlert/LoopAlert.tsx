// The rebate-loop warning: a banner that cannot be missed, announced to screen readers at once,
// listing each loop's lanes with their file rows and contract references and the net per lap.
// Once read (the user acts anywhere else, or presses Fold) it folds to one line that keeps the loop
// in words and a button to unfold it, so on a laptop screen the map and the panels get the room.

import { useEffect, useRef, useState } from 'react';
import { FLAG_LIMIT_HIDES_LOOP } from '../../model/flags';
import { formatMoneyWithCode } from '../../model/format';
import { addedLaneOf, type AddedLane } from '../../model/added-lanes';
import { counted, netCost, plural } from '../../../engine/index';
import type { LaneAmounts } from '../../model/scenario-edits';
import type { NetworkView, SolveView } from '../../worker/protocol';
import { TableHead } from '../DataTable/DataTable';
import { laneRef } from '../../model/lane-names';

const LOOP_LANE_HEADS = ['Lane', 'File row', 'Contract ref', { label: 'Net', numeric: true }, { label: 'Rebate', numeric: true }];

export interface LoopAlertProps {
  network: NetworkView;
  solve: SolveView;
  /** Lane amounts under the active scenario. */
  amounts: LaneAmounts;
  /** Lanes the scenario adds (a loop may run through them). */
  added: readonly AddedLane[];
  onReview(): void;
}

/** Same loops (by depots) = same banner: re-solves for other edits keep it folded. */
function loopsKey(solve: SolveView): string {
  return solve.loops.map((loop) => loop.depots.join(',')).join(';');
}

export function LoopAlert(props: LoopAlertProps) {
  if (props.solve.loops.length === 0) return null;
  return <LoopBanner key={loopsKey(props.solve)} {...props} />;
}

function LoopBanner({ network, solve, amounts, added, onReview }: LoopAlertProps) {
  const [folded, setFolded] = useState(false);
  const box = useRef<HTMLElement>(null);
  // Read = the user has moved on: a click or a key anywhere outside the banner folds it. On the
  // click, not the press: folding moves the page up, which must not happen under a press in progress.
  useEffect(() => {
    if (folded) return;
    const onElsewhere = (event: Event) => {
      // A target gone from the page is the banner's own button that just re-rendered it (Details).
      if (box.current && event.target instanceof Node && event.target.isConnected && !box.current.contains(event.target)) setFolded(true);
    };
    document.addEventListener('click', onElsewhere);
    document.addEventListener('keydown', onElsewhere);
    return () => {
      document.removeEventListener('click', onElsewhere);
      document.removeEventListener('keydown', onElsewhere);
    };
  }, [folded]);
  const unbounded = solve.status.reduce((n, s) => n + (s === 2 ? 1 : 0), 0);
  const limited = solve.settings.maxLegs !== null;
  const hidden = solve.flags.reduce((n, f) => n + ((f & FLAG_LIMIT_HIDES_LOOP) !== 0 ? 1 : 0), 0);
  const id = (d: number) => network.depotIds[d];
  const first = solve.loops[0];
  if (folded)
    return (
      <section className="lw-loop-alert lw-folded" role="alert" aria-labelledby="lw-loop-alert-title" ref={box} data-folded="yes">
        <h2 id="lw-loop-alert-title">
          <span className="lw-alert-icon" aria-hidden="true">
            ⚠
          </span>{' '}
          Rebate loop: {first.depots.map(id).join(' → ')} → {id(first.depots[0])} · net per lap {formatMoneyWithCode(first.netPerLap, network.currency, network.exponent)}
          {solve.loops.length > 1 ? ` (+${solve.loops.length - 1} more)` : ''}
          {limited ? '' : ` · ${unbounded} unbounded`}
        </h2>
        <button type="button" aria-expanded="false" onClick={() => setFolded(false)}>
          Details
        </button>
        <button type="button" onClick={onReview}>
          Contract review
        </button>
      </section>
    );
  return (
    <section className="lw-loop-alert" role="alert" aria-labelledby="lw-loop-alert-title" ref={box} data-folded="no">
      <button type="button" className="lw-fold" aria-expanded="true" onClick={() => setFolded(true)}>
        Fold to one line
      </button>
      <h2 id="lw-loop-alert-title">
        <span className="lw-alert-icon" aria-hidden="true">
          ⚠
        </span>{' '}
        Rebate loop: costs are unbounded — the contract terms need fixing
      </h2>
      <p>
        {solve.loops.length === 1 ? 'A loop of lanes' : `${solve.loops.length} loops of lanes`} from origin {id(solve.origin)} earn more in rebates than they cost, so a truck could circle forever and “cheapest” has no answer.{' '}
        {limited
          ? `With the ${solve.settings.maxLegs}-leg limit every cost shown is finite, but without it ${counted(hidden, 'depot')} ${plural(hidden, 'is', 'are')} unbounded (flag “limit hides loop”).`
          : `${counted(unbounded, 'depot')} ${plural(unbounded, 'is', 'are')} marked unbounded (∞ diamond on the map, “unbounded” in the table); no route is given for them.`}
      </p>
      {solve.loops.map((loop, i) => (
        <details key={i} className="lw-loop" open={i === 0}>
          <summary>
            <strong>
              Loop {i + 1}: {loop.depots.map(id).join(' → ')} → {id(loop.depots[0])} · net per lap {formatMoneyWithCode(loop.netPerLap, network.currency, network.exponent)}
            </strong>
          </summary>
          <table className="lw-compact">
            <caption className="lw-visually-hidden">Lanes of loop {i + 1}</caption>
            <TableHead labels={LOOP_LANE_HEADS} />
            <tbody>
              {loop.lanes.map((e, k) => {
                const extra = addedLaneOf(added, e);
                if (extra) {
                  const l = extra.lane;
                  return (
                    <tr key={`added-${k}`}>
                      <td>
                        {l.from} → {l.to}
                      </td>
                      <td>{extra.kind === 'added' ? `added by the scenario (change ${extra.changeIndex + 1})` : `${extra.sourceRow}, valid by the scenario (change ${extra.changeIndex + 1})`}</td>
                      <td>{l.ref ?? '—'}</td>
                      <td className="lw-num">{formatMoneyWithCode(extra.netMinor, network.currency, network.exponent)}</td>
                      <td className="lw-num">{formatMoneyWithCode(l.rebateMinor, network.currency, network.exponent)}</td>
                    </tr>
                  );
                }
                if (e < 0)
                  return (
                    <tr key={`added-${k}`}>
                      <td colSpan={5}>a lane the scenario adds (see the scenario’s changes)</td>
                    </tr>
                  );
                const net = netCost(amounts.toll[e], amounts.fuel[e], amounts.fees[e], amounts.rebate[e]);
                return (
                  <tr key={e}>
                    <td>
                      {id(network.laneFrom[e])} → {id(network.laneTo[e])}
                    </td>
                    <td>{network.laneRow[e]}</td>
                    <td>{laneRef(network, e) ?? '—'}</td>
                    <td className="lw-num">{formatMoneyWithCode(net, network.currency, network.exponent)}</td>
                    <td className="lw-num">{formatMoneyWithCode(amounts.rebate[e], network.currency, network.exponent)}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </details>
      ))}
      <button type="button" onClick={onReview}>
        Open contract review
      </button>
    </section>
  );
}
