// The status line: what is loaded, what the plan found and how long the last recompute took.
// A polite live region, so screen readers hear results without losing their place.

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
  const reachable = solve ? solve.status.reduce((n, s) => n + (s === 1 ? 1 : 0), 0) : 0;
  const unbounded = solve ? solve.status.reduce((n, s) => n + (s === 2 ? 1 : 0), 0) : 0;
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
