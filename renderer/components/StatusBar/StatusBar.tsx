// The status line: what is loaded, what the plan found and how long the last recompute took.
// A polite live region, so screen readers hear results without losing their place.

import { useMemo } from 'react';
import { counted } from '../../../engine/index';
import { formatMs } from '../../model/format';
import type { NetworkView, SolveView } from '../../worker/protocol';

export interface StatusBarProps {
  network: NetworkView | null;
  solve: SolveView | null;
  roundTripMs: number | null;
  solving: boolean;
  message: string | null;
}

export function StatusBar({ network, solve, roundTripMs, solving, message }: StatusBarProps) {
  // Counted once per solve in a plain loop (the bar renders again on every "recomputing" toggle).
  const [reachable, unbounded] = useMemo(() => {
    let r = 0;
    let u = 0;
    const status = solve?.status ?? new Uint8Array(0);
    for (let d = 0; d < status.length; d++) {
      if (status[d] === 1) r++;
      else if (status[d] === 2) u++;
    }
    return [r, u];
  }, [solve]);
  return (
    <footer className="lw-status" role="status" aria-live="polite">
      {network && (
        <span>
          {counted(network.depotIds.length, 'depot')} · {counted(network.laneFrom.length, 'lane')}
        </span>
      )}
      {solve && (
        <span>
          {' '}
          · {reachable} reachable{unbounded ? `, ${unbounded} unbounded` : ''}
        </span>
      )}
      {solving && <span> · recomputing…</span>}
      {!solving && solve && roundTripMs !== null && (
        <span data-testid="recompute-ms" data-round-trip-ms={roundTripMs.toFixed(2)} data-solve-ms={solve.solveMs.toFixed(2)}>
          {' '}
          · recomputed in {formatMs(roundTripMs)} (engine {formatMs(solve.solveMs)})
        </span>
      )}
      {message && <span className="lw-message"> · {message}</span>}
    </footer>
  );
}
