// Depots reached by keyboard on the map, as the results rows are: one Tab stop (a ring over the
// current depot), arrow keys move to the nearest depot in that direction on screen, Home goes to
// the origin, Enter shows the depot's route and Shift+Enter plans from it. The map pans to follow.

import L from 'leaflet';
import { useEffect, useRef, useState } from 'react';
import type { NetworkView, SolveView } from '../worker/protocol';
import { directionOfKey, stepToward } from './depot-steps';
import { textNode } from './dom-text';

export interface CursorHandlers {
  onSelect(depot: number): void;
  onPlanFrom(depot: number): void;
}

/** Depots weighed per arrow key at most: a box around the cursor shrinks until it holds no more. */
export const MAX_STEP_CANDIDATES = 5_000;

/** Depots in a lat/lon box around `at` (the view's size, halved until at most `cap` remain), `at` first. */
function candidatesAround(network: NetworkView, map: L.Map, at: number, cap: number): number[] {
  const view = map.getBounds();
  let halfLat = (view.getNorth() - view.getSouth()) / 2;
  let halfLon = (view.getEast() - view.getWest()) / 2;
  const lat0 = network.lat[at];
  const lon0 = network.lon[at];
  for (;;) {
    const out = [at];
    for (let d = 0; d < network.lat.length && out.length <= cap; d++) {
      if (d !== at && Math.abs(network.lat[d] - lat0) <= halfLat && Math.abs(network.lon[d] - lon0) <= halfLon) out.push(d);
    }
    if (out.length <= cap) return out;
    halfLat /= 2;
    halfLon /= 2;
  }
}

const STATUS_WORDS = ['not reachable', 'reachable', 'cost unbounded (rebate loop)'];

function describe(network: NetworkView, solve: SolveView | null, d: number): string {
  const origin = solve && solve.origin === d ? ', origin' : '';
  const status = solve ? `, ${STATUS_WORDS[solve.status[d]] ?? ''}` : '';
  return `Depot ${network.depotIds[d]} · ${network.depotNames[d]}${origin}${status}`;
}

/** Adds the cursor marker; returns what a screen reader is told after each move. */
export function useDepotCursor(map: L.Map | null, network: NetworkView | null, solve: SolveView | null, selected: number | null, handlers: CursorHandlers, helpId: string): string {
  const handlersRef = useRef(handlers);
  handlersRef.current = handlers;
  const solveRef = useRef(solve);
  solveRef.current = solve;
  const cursor = useRef<{ marker: L.Marker; at: number; moveTo(d: number, pan: boolean): void } | null>(null);
  const [spoken, setSpoken] = useState('');

  useEffect(() => {
    if (!map || !network || network.depotIds.length === 0) return;
    const icon = L.divIcon({ className: 'lw-depot-cursor', html: textNode('', 'lw-depot-cursor-ring'), iconSize: [26, 26], iconAnchor: [13, 13] });
    const start = solveRef.current?.origin ?? 0;
    const marker = L.marker([network.lat[start], network.lon[start]], { icon, keyboard: true, zIndexOffset: 1000 });
    const state = {
      marker,
      at: start,
      moveTo(d: number, pan: boolean) {
        state.at = d;
        const at = L.latLng(network.lat[d], network.lon[d]);
        marker.setLatLng(at);
        const text = describe(network, solveRef.current, d);
        marker.getElement()?.setAttribute('aria-label', text);
        if (pan) {
          map.panInside(at, { padding: [40, 40], animate: false });
          setSpoken(text);
        }
      },
    };
    marker.addTo(map);
    const element = marker.getElement();
    element?.setAttribute('aria-describedby', helpId);
    element?.setAttribute('data-testid', 'map-depot-cursor');
    state.moveTo(start, false);
    marker.on('click', () => handlersRef.current.onSelect(state.at));
    const onKey = (event: KeyboardEvent) => {
      const direction = directionOfKey(event.key);
      let next: number | null = null;
      if (direction) {
        // A capped list of depots around the cursor: 50,000 projections per key press froze the page.
        const near = candidatesAround(network, map, state.at, MAX_STEP_CANDIDATES);
        const x = new Float64Array(near.length);
        const y = new Float64Array(near.length);
        near.forEach((d, i) => {
          const p = map.latLngToContainerPoint([network.lat[d], network.lon[d]]);
          x[i] = p.x;
          y[i] = p.y;
        });
        const step = stepToward(x, y, 0, direction);
        next = step === null ? null : near[step];
        if (next === null) setSpoken(`No depot further ${direction}.`);
      } else if (event.key === 'Home') {
        next = solveRef.current?.origin ?? 0;
      } else if (event.key === 'Enter') {
        if (event.shiftKey) handlersRef.current.onPlanFrom(state.at);
        else handlersRef.current.onSelect(state.at);
      } else return;
      event.preventDefault();
      event.stopPropagation();
      if (next !== null) state.moveTo(next, true);
    };
    element?.addEventListener('keydown', onKey);
    cursor.current = state;
    return () => {
      element?.removeEventListener('keydown', onKey);
      marker.remove();
      cursor.current = null;
    };
  }, [map, network, helpId]);

  // A depot picked elsewhere (table, click) becomes the keyboard's starting point.
  useEffect(() => {
    if (selected !== null && cursor.current && network && selected < network.depotIds.length) cursor.current.moveTo(selected, false);
  }, [selected, network]);
  useEffect(() => {
    const c = cursor.current;
    if (c && network && c.at < network.depotIds.length) c.moveTo(c.at, false);
  }, [solve, network]);
  return spoken;
}
