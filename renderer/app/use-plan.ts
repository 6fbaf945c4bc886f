// Keeps the plan current: whenever the network, the controls or the scenario change, a solve is
// queued (debounced, so typing in a field does not start a solve per key) and the newest answer
// wins. Also fetches the selected depot's route.

import { useEffect, useRef, useState } from 'react';
import type { Scenario } from '../model/scenario-edits';
import type { NetworkView, PlanSettings, RouteView, SolveView } from '../worker/protocol';
import { WorkCancelledError, type Engine } from './use-engine';

const DEBOUNCE_MS = 120;

export interface Plan {
  solve: SolveView | null;
  /** The network `solve` was computed on; a solve of an older network is never shown. */
  solvedFor: NetworkView | null;
  /** Time from sending the solve to having its answer on the UI thread. */
  roundTripMs: number | null;
  route: RouteView | null;
  error: string | null;
  solving: boolean;
  /** Number of solves shown so far (lets tests and screen readers tell a new answer from the last). */
  solveCount: number;
}

export function usePlan(engine: Engine, network: NetworkView | null, settings: PlanSettings, scenario: Scenario | null, selected: number | null, generation = 0): Plan {
  // The answer with the network it was computed on and its request id (routes are asked for by it).
  const [shown, setShown] = useState<{ view: SolveView; network: NetworkView; id: number } | null>(null);
  const [roundTripMs, setRoundTrip] = useState<number | null>(null);
  // The route with the solve it was fetched for: after a new solve (or a new network) the old route's
  // lane numbers may mean other lanes, so it is never shown with another solve.
  const [routeOf, setRoute] = useState<{ route: RouteView | null; solve: SolveView | null }>({ route: null, solve: null });
  const [error, setError] = useState<string | null>(null);
  const [solving, setSolving] = useState(false);
  const [solveCount, setSolveCount] = useState(0);
  const latest = useRef(0);

  useEffect(() => {
    if (!network || !network.depotIds.includes(settings.origin)) {
      // Supersede any solve still in flight, so its answer is not shown over this state.
      latest.current++;
      setShown(null);
      setSolving(false);
      return;
    }
    const ticket = ++latest.current;
    setSolving(true);
    const timer = setTimeout(async () => {
      const started = performance.now();
      try {
        const answer = await engine.track((onProgress) => engine.client.request('solve', { settings, scenario }, onProgress), 'Solving');
        if (ticket !== latest.current) return;
        setShown({ view: answer.result, network, id: answer.id });
        setSolveCount((n) => n + 1);
        setRoundTrip(performance.now() - started);
        setError(null);
      } catch (caught) {
        if (ticket === latest.current && !(caught instanceof WorkCancelledError)) setError((caught as Error).message);
      } finally {
        if (ticket === latest.current) setSolving(false);
      }
    }, DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [engine, network, settings, scenario, generation]);

  const solve = shown?.view ?? null;
  const solveId = shown?.id ?? null;
  useEffect(() => {
    if (!solve || solveId === null || selected === null || solve.status[selected] !== 1) {
      setRoute({ route: null, solve });
      return;
    }
    let live = true;
    engine.client
      .request('route', { target: selected, solveId })
      .then((answer) => live && setRoute({ route: answer.route, solve }))
      .catch(() => live && setRoute({ route: null, solve }));
    return () => {
      live = false;
    };
  }, [engine, solve, solveId, selected]);

  const route = routeOf.solve === solve ? routeOf.route : null;
  return { solve, solvedFor: shown?.network ?? null, roundTripMs, route, error, solving, solveCount };
}
