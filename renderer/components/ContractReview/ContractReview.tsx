// The contract-review view: every rebate loop in the whole contract (not only those reachable from
// the origin), with the lanes, file rows and references that form it. Computed in the worker on demand.

import { useEffect, useState } from 'react';
import { formatMoneyWithCode } from '../../model/format';
import type { Scenario } from '../../model/scenario-edits';
import type { ContractReviewView } from '../../worker/review';
import type { NetworkView } from '../../worker/protocol';
import type { Engine } from '../../app/use-engine';

export interface ContractReviewProps {
  engine: Engine;
  network: NetworkView;
  scenario: Scenario;
}

export function ContractReview({ engine, network, scenario }: ContractReviewProps) {
  const [review, setReview] = useState<ContractReviewView | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    setReview(null);
    engine
      .track((onProgress) => engine.client.request<'reviewed'>({ kind: 'review' }, onProgress), 'Reviewing the contract')
      .then((answer) => live && setReview(answer.review as ContractReviewView))
      .catch((error: Error) => live && setProblem(error.message));
    return () => {
      live = false;
    };
  }, [engine, network, scenario]);
  if (problem) return <p className="lw-warn">{problem}</p>;
  if (!review) return <p aria-busy="true">Reviewing the contract…</p>;
  const id = (d: number) => network.depotIds[d];
  return (
    <div className="lw-review" data-testid="contract-review">
      <h3>Rebate loops in the whole contract{scenario.changes.length > 0 ? ` (scenario “${scenario.name}”)` : ''}</h3>
      {review.loops.length === 0 ? (
        <p>No loop of lanes has a negative net cost: every cheapest route is well defined.</p>
      ) : (
        <ol>
          {review.loops.map((loop, i) => (
            <li key={i}>
              <strong>
                {loop.depots.map(id).join(' → ')} → {id(loop.depots[0])}
              </strong>{' '}
              — net per lap {formatMoneyWithCode(loop.netPerLap, network.currency, network.exponent)}; lanes file rows {loop.lanes.map((e) => network.laneRow[e]).join(', ')}
              {loop.lanes.some((e) => network.laneRef[e]) && <> (refs {loop.lanes.map((e) => network.laneRef[e] ?? '—').join(', ')})</>}
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
