// The offline basemap: land and country borders from Natural Earth (world-atlas, 1:50m), painted on
// one canvas (basemap-paint.ts draws it). No tile layer exists anywhere in the app, so no tile
// server is contacted. Painted by the paint worker where OffscreenCanvas exists (filling the land
// in software took tens of milliseconds per frame on the UI thread), else on the UI thread.

import type L from 'leaflet';
import { paintBasemap } from './basemap-paint';
import { layerTransform, PaintLayer, viewBoxOf } from './lane-canvas';
import { OffscreenPaintLayer } from './offscreen-layer';
import { offscreenPaintAvailable } from './paint/paint-client';

/** Adds land and borders to the map in `pane`, under everything else; non-interactive. */
export function addBasemap(map: L.Map, pane: string): void {
  if (offscreenPaintAvailable()) {
    new OffscreenPaintLayer(pane, null, { kind: 'basemap' }).addTo(map);
    return;
  }
  new PaintLayer(pane, (ctx, bounds, m) => paintBasemap(ctx, layerTransform(m), viewBoxOf(m, bounds))).addTo(map);
}
