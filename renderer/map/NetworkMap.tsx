// The map view: a Leaflet map with the offline basemap, the lanes, the route tree from the origin,
// rebate loops and the selected route. Leaflet is created once; each layer is swapped on its own
// when its inputs change, so selecting a depot does not redraw 500,000 lanes. All lanes and the tree
// are painted on canvases with level of detail (lane-canvas.ts): above a lane count only the lanes
// in view are drawn, thinned to a cap, and the map says how many of how many it shows.

import L from 'leaflet';
import 'leaflet/dist/leaflet.css';
import { useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { MAP_CAUTION } from '../../engine/index';
import type { NetworkView, RouteView, SolveView } from '../worker/protocol';
import { addBasemap } from './basemap';
import type { AddedLane } from '../model/added-lanes';
import { depotLabelLayer } from './depot-labels';
import { fitNetwork, depotsInView } from './fit-view';
import { addedLaneLayer, depotMarkers, loopLayer, routeLayer, solveMarkers, styleDepots } from './network-layers';
import { loadRouteLayer, type LoadRouteDrawing } from './load-route-layer';
import { allLanesLayer, laneSetLayer, type LaneLayer, type LaneSetLayer } from './lane-layers';
import { LANE_DETAIL_THRESHOLD, type LaneCounts } from './lane-paint';
import { DEPOT_CANVAS_THRESHOLD, depotCanvas, type DepotCanvas } from './depot-canvas';
import { leavingCanvas } from './lane-canvas';
import { STYLE } from './map-style';
import { useDepotCursor } from './use-depot-cursor';
import './map.css';
import { counted } from '../../engine/index';

export interface NetworkMapProps {
  network: NetworkView | null;
  solve: SolveView | null;
  route: RouteView | null;
  /** Lanes the active scenario adds (drawn dotted and labelled). */
  added: readonly AddedLane[];
  selected: number | null;
  onSelect(depot: number): void;
  onPlanFrom(depot: number): void;
  /** A load's route and alternatives from the Loads panel. */
  loadRoutes?: readonly LoadRouteDrawing[] | null;
  /** The map key, placed in the corner the fitted network keeps clear. */
  legend?: ReactNode;
}

/** One layer slot of the map, rebuilt when `deps` change (`build` is a new closure every render). */
function useLayer(map: L.Map | null, build: (() => L.Layer | null) | null, deps: unknown[]) {
  useEffect(() => {
    if (!map || !build) return;
    const layer = build();
    if (!layer) return;
    layer.addTo(map);
    return () => {
      layer.remove();
    };
  }, [map, ...deps]);
}

/**
 * `lanes`, or the previous array when it holds the same lanes (so effects keyed on it do not rerun).
 * Compared only when a new array arrives: the map renders again on every painted frame's counts,
 * and comparing 50,000 tree lanes each time was the map's largest piece of UI-thread work.
 */
function useSameLanes(lanes: Int32Array | null): Int32Array | null {
  const last = useRef<{ input: Int32Array | null; output: Int32Array | null }>({ input: null, output: null });
  const { input, output } = last.current;
  if (lanes === input) return output;
  let same = lanes !== null && output !== null && output.length === lanes.length;
  for (let i = 0; same && i < lanes!.length; i++) same = lanes![i] === output![i];
  last.current = { input: lanes, output: same ? output : lanes };
  return last.current.output;
}

const NO_LANES = new Int32Array(0);

interface Renderers {
  /** Pane of the painted basemap. */
  basePane: string;
  /** Panes of the painted canvases: all lanes, and the route tree above them. */
  lanesPane: string;
  treePane: string;
  overlay: L.Renderer;
  depots: L.Renderer;
  depotsPane: string;
}

// One canvas per kind of content, stacked in their own panes: a new solve repaints only the route
// tree's canvas, never the basemap's polygons or 500,000 lanes.
function makeRenderers(map: L.Map): Renderers {
  const pane = (name: string, zIndex: number) => {
    map.createPane(name).style.zIndex = String(zIndex);
    return name;
  };
  const depotsPane = pane('lw-depots', 450);
  // Margins of a fifth of the view: every moveend repaints the whole canvas, and without a GPU the
  // cost grows with its area (half a view each side made the basemap four times the view).
  return {
    basePane: pane('lw-base', 250),
    lanesPane: pane('lw-lanes', 350),
    treePane: pane('lw-tree', 390),
    overlay: leavingCanvas({ padding: 0.2 }),
    depots: leavingCanvas({ pane: depotsPane, padding: 0.2, tolerance: 4 }),
    depotsPane,
  };
}

/** A painted canvas layer rebuilt when `deps` change. */
function usePaintLayer(map: L.Map | null, build: (() => LaneLayer) | null, deps: unknown[]) {
  useEffect(() => {
    if (!map || !build) return;
    const layer = build();
    layer.addTo(map);
    return () => void layer.remove();
  }, [map, ...deps]);
}

export function NetworkMap({ network, solve, route, added, selected, onSelect, onPlanFrom, loadRoutes, legend }: NetworkMapProps) {
  const element = useRef<HTMLDivElement>(null);
  // The tools and the key sit over the map's top-right corner; fitting keeps the network clear of them.
  const corner = useRef<HTMLDivElement>(null);
  const [labelsOn, setLabelsOn] = useState(true);
  // Bumped when the view moves or resizes: labels and the in-view count follow it.
  const [view, setView] = useState(0);
  // The zoom the view has settled at. During Leaflet's zoom animation getZoom() already gives the
  // target while a second zoom request is still ignored, so what the page states (data-zoom) is
  // taken only when the zoom has ended: a reader that waits for it can zoom again at once.
  const [settledZoom, setSettledZoom] = useState<number | null>(null);
  const mapRef = useRef<{ map: L.Map; renderers: Renderers } | null>(null);
  const selectRef = useRef(onSelect);
  selectRef.current = onSelect;
  const planFromRef = useRef(onPlanFrom);
  planFromRef.current = onPlanFrom;
  // Bumped once the map exists, so the layer effects run after it is created.
  const [ready, setReady] = useState(0);
  const autoFit = useRef(true);
  const fitTo = useRef<L.LatLngBounds | null>(null);

  useEffect(() => {
    if (!element.current) return;
    const map = L.map(element.current, { preferCanvas: true, zoomSnap: 0.25, worldCopyJump: false, attributionControl: true });
    // The caution is this app's own constant text (attribution takes HTML, so never file text here).
    // As the prefix it reads as its own sentence, set apart from the data credit ("…(public domain),
    // Costs are estimates" read as one run-on line when both were attributions).
    map.attributionControl.setPrefix(MAP_CAUTION).addAttribution('Land and borders: Natural Earth (public domain)');
    map.setView([49.5, 6], 5);
    const renderers = makeRenderers(map);
    addBasemap(map, renderers.basePane);
    mapRef.current = { map, renderers };
    setReady((n) => n + 1);
    map.on('moveend zoomend resize', () => setView((n) => n + 1));
    map.on('zoomend', () => setSettledZoom(map.getZoom()));
    setSettledZoom(map.getZoom());
    // The panels around the map resize (loop banner, window, splitter), and so does the key when it
    // is opened or closed; Leaflet must re-measure its box. Until the user pans or zooms, the map
    // keeps the whole network in view as its box changes.
    const resize = new ResizeObserver(() => {
      map.invalidateSize();
      if (autoFit.current && fitTo.current) fitNetwork(map, fitTo.current, corner.current);
    });
    resize.observe(element.current);
    if (corner.current) resize.observe(corner.current);
    const stopAutoFit = () => (autoFit.current = false);
    element.current.addEventListener('wheel', stopAutoFit, { passive: true });
    // Any pan or zoom by pointer or key (drag, the zoom buttons, +/-) is the user taking the view:
    // a later resize of the box or the key must not fit the network again over it.
    element.current.addEventListener('pointerdown', stopAutoFit);
    element.current.addEventListener('keydown', stopAutoFit);
    element.current.addEventListener('mousedown', stopAutoFit);
    element.current.addEventListener('keydown', stopAutoFit);
    return () => {
      resize.disconnect();
      map.remove();
      mapRef.current = null;
    };
  }, []);

  const map = ready > 0 ? mapRef.current?.map ?? null : null;
  const renderers = mapRef.current?.renderers ?? null;

  useEffect(() => {
    if (!map || !network || network.depotIds.length === 0) return;
    // Corners by a plain loop: a LatLng per depot cost a fifth of a second at 50,000 depots.
    let south = Infinity, west = Infinity, north = -Infinity, east = -Infinity;
    for (let d = 0; d < network.lat.length; d++) {
      south = Math.min(south, network.lat[d]);
      north = Math.max(north, network.lat[d]);
      west = Math.min(west, network.lon[d]);
      east = Math.max(east, network.lon[d]);
    }
    const bounds = L.latLngBounds([south, west], [north, east]);
    fitTo.current = bounds;
    autoFit.current = true;
    fitNetwork(map, bounds, corner.current);
  }, [map, network]);
  const fit = useCallback(() => {
    if (!map || !fitTo.current) return;
    autoFit.current = true;
    fitNetwork(map, fitTo.current, corner.current);
  }, [map]);

  // What the lane canvas drew in its last frame (it paints as the view moves).
  const [laneCounts, setLaneCounts] = useState<LaneCounts | null>(null);
  const [depotCounts, setDepotCounts] = useState<{ drawn: number; inView: number } | null>(null);
  const onDepotCounts = useCallback((drawn: number, inView: number) => setDepotCounts((now) => (now && now.drawn === drawn && now.inView === inView ? now : { drawn, inView })), []);
  const onCounts = useCallback((next: LaneCounts) => setLaneCounts((now) => (now && now.drawn === next.drawn && now.inView === next.inView && now.total === next.total ? now : next)), []);
  usePaintLayer(map, network && renderers ? () => allLanesLayer(renderers.lanesPane, network, STYLE.lane, onCounts) : null, [network]);
  // Most edits leave the route tree as it was: the same lanes keep the painted picture. The tree's
  // canvas lives as long as the network; a new tree is new content for it, so the old picture stays
  // until the new one is painted.
  const tree = useSameLanes(solve?.treeLanes ?? null);
  const treeLayer = useRef<LaneSetLayer | null>(null);
  useEffect(() => {
    if (!map || !network || !renderers) return;
    const layer = laneSetLayer(renderers.treePane, network, NO_LANES, [], STYLE.tree);
    layer.addTo(map);
    treeLayer.current = layer;
    return () => {
      layer.remove();
      treeLayer.current = null;
    };
  }, [map, network, renderers]);
  useEffect(() => treeLayer.current?.setLanes(tree ?? NO_LANES, added), [map, network, renderers, tree, added]);
  useLayer(map, network && added.length > 0 && renderers ? () => addedLaneLayer(network, added, renderers.overlay) : null, [network, added]);
  useLayer(map, network && route && renderers ? () => routeLayer(network, route, added, renderers.overlay) : null, [network, route, added]);
  useLayer(map, network && loadRoutes && renderers ? () => loadRouteLayer(network, loadRoutes, renderers.overlay) : null, [network, loadRoutes]);
  useLayer(map, network && solve && solve.loops.length > 0 && renderers ? () => loopLayer(network, solve, added, renderers.overlay) : null, [network, solve, added]);
  // Depot circles are made once per network and only restyled per solve: Leaflet circle markers
  // for a small network (each with its tooltip), one painted canvas for a large one.
  const bigNetwork = (network?.depotIds.length ?? 0) > DEPOT_CANVAS_THRESHOLD;
  const [depots, setDepots] = useState<L.CircleMarker[] | null>(null);
  const [depotPaint, setDepotPaint] = useState<DepotCanvas | null>(null);
  useEffect(() => {
    if (!map || !network || !renderers) return;
    const handlers = { onSelect: (d: number) => selectRef.current(d), onPlanFrom: (d: number) => planFromRef.current(d) };
    if (network.depotIds.length > DEPOT_CANVAS_THRESHOLD) {
      const canvas = depotCanvas(renderers.depotsPane, network, handlers, onDepotCounts);
      const detach = canvas.attach(map);
      setDepotPaint(canvas);
      return () => {
        detach();
        setDepotPaint(null);
        setDepotCounts(null);
      };
    }
    const made = depotMarkers(network, renderers.depots, handlers);
    made.layer.addTo(map);
    setDepots(made.markers);
    return () => {
      made.layer.remove();
      setDepots(null);
    };
  }, [map, network, renderers, onDepotCounts]);
  useEffect(() => {
    if (depots && network && depots.length === network.depotIds.length) styleDepots(depots, solve, selected);
    depotPaint?.restyle(solve, selected);
  }, [depots, depotPaint, network, solve, selected]);
  useLayer(map, network && solve ? () => solveMarkers(network, solve, { onSelect: (d) => selectRef.current(d), onPlanFrom: (d) => planFromRef.current(d) }) : null, [network, solve]);

  // Depot ids beside the depots when zoomed in; rebuilt as the view moves (only depots in view).
  const [labelCount, setLabelCount] = useState(0);
  useEffect(() => {
    if (!map || !network || !labelsOn) return setLabelCount(0);
    const layer = depotLabelLayer(map, network);
    setLabelCount(layer ? (layer as L.LayerGroup).getLayers().length : 0);
    if (!layer) return;
    layer.addTo(map);
    return () => {
      layer.remove();
    };
  }, [map, network, labelsOn, view]);
  const inView = useMemo(() => (map && network && view >= 0 ? depotsInView(map, network, corner.current) : 0), [map, network, view]);
  const spoken = useDepotCursor(map, network, solve, selected, { onSelect: (d) => selectRef.current(d), onPlanFrom: (d) => planFromRef.current(d) }, 'lw-map-keys');

  const loopCount = solve?.loops.length ?? 0;
  const addedDrawn = added.filter((a) => a.from >= 0 && a.to >= 0).length;
  const unbounded = useMemo(() => (solve ? solve.status.reduce((n, s) => n + (s === 2 ? 1 : 0), 0) : 0), [solve]);
  const depotCount = network?.depotIds.length ?? 0;
  const laneTotal = network?.laneFrom.length ?? 0;
  const thinned = laneTotal > LANE_DETAIL_THRESHOLD && laneCounts !== null && laneCounts.total === laneTotal;
  return (
    <div className="lw-map-frame">
      <div
        className="lw-map"
        ref={element}
        role="region"
        aria-label={`Network map: ${counted(depotCount, 'depot')} (${inView} in view), ${counted(network?.laneFrom.length ?? 0, 'lane')}${addedDrawn ? `, ${counted(addedDrawn, 'lane')} only the scenario plans drawn dotted and labelled` : ''}${loopCount ? `, ${counted(loopCount, 'rebate loop')} drawn dashed, ${counted(unbounded, 'unbounded depot')} marked with a diamond` : ''}`}
        data-loops={loopCount}
        data-unbounded={unbounded}
        data-added-lanes={addedDrawn}
        data-tree-lanes={solve?.treeLanes.length ?? 0}
        data-depots-in-view={inView}
        data-depot-labels={labelCount}
        data-lanes-drawn={laneCounts?.drawn ?? ''}
        data-depot-canvas={bigNetwork ? 'yes' : 'no'}
        data-zoom={settledZoom ?? ''}
      />
      <div className="lw-map-corner" ref={corner}>
        <div className="lw-map-tools" role="group" aria-label="Map view">
          <button type="button" onClick={fit} disabled={!network}>
            Fit network
          </button>
          <label className="lw-check">
            <input type="checkbox" checked={labelsOn} onChange={(event) => setLabelsOn(event.target.checked)} /> Depot labels
          </label>
        </div>
        {legend}
      </div>
      {thinned && (
        <p className="lw-map-thinned" data-testid="map-thinned" title="Above this many lanes the map draws the route tree, the selected route, rebate loops and a share of the lanes in view; zoom in to see more of them">
          Lanes thinned: {laneCounts.drawn.toLocaleString('en')} of {laneTotal.toLocaleString('en')} drawn ({laneCounts.inView.toLocaleString('en')} in view)
          {depotCounts && depotCounts.drawn < depotCounts.inView ? ` · depots: ${depotCounts.drawn.toLocaleString('en')} of ${depotCounts.inView.toLocaleString('en')} in view drawn` : ''}
        </p>
      )}
      <p id="lw-map-keys" className="lw-visually-hidden">
        Arrow keys move to the nearest depot in that direction, Home to the origin; Enter shows the depot's route, Shift+Enter plans from it.
      </p>
      <p className="lw-visually-hidden" role="status">
        {spoken}
      </p>
    </div>
  );
}
