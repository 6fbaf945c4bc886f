// The offline basemap's drawing: land and country borders from Natural Earth (world-atlas, 1:50m),
// projected once to Mercator metres; each paint maps them with one affine step, skipping rings
// outside the view and points under a pixel apart. Apart from Leaflet, so the paint worker and the
// UI thread's fallback (basemap.ts) draw the same.

import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import countries from 'world-atlas/countries-50m.json';
import type { ViewBox } from './lane-grid';
import { mercatorX, mercatorY, type ViewTransform } from './mercator';

const LAND = '#ece8dc';
const BORDER = { color: '#b4ab96', weight: 0.8 };

/** One ring or line: Mercator metres (x, y interleaved) and its latitude / longitude box. */
interface Ring {
  xy: Float64Array;
  south: number;
  west: number;
  north: number;
  east: number;
}

export interface Basemap {
  land: Ring[];
  borders: Ring[];
}

/** The part of a 2D context the basemap paint uses. */
export interface ShapeContext {
  beginPath(): void;
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  closePath(): void;
  fill(rule?: CanvasFillRule): void;
  stroke(): void;
  fillStyle: unknown;
  strokeStyle: unknown;
  lineWidth: number;
  lineJoin: CanvasLineJoin;
}

function ringOf(points: number[][]): Ring {
  const xy = new Float64Array(points.length * 2);
  let south = Infinity, west = Infinity, north = -Infinity, east = -Infinity;
  points.forEach(([lon, lat], i) => {
    xy[2 * i] = mercatorX(lon);
    xy[2 * i + 1] = mercatorY(lat);
    south = Math.min(south, lat);
    north = Math.max(north, lat);
    west = Math.min(west, lon);
    east = Math.max(east, lon);
  });
  return { xy, south, west, north, east };
}

function ringsOf(geometry: { type: string; coordinates: unknown }): Ring[] {
  if (geometry.type === 'Polygon') return (geometry.coordinates as number[][][]).map(ringOf);
  if (geometry.type === 'MultiPolygon') return (geometry.coordinates as number[][][][]).flat().map(ringOf);
  if (geometry.type === 'LineString') return [ringOf(geometry.coordinates as number[][])];
  if (geometry.type === 'MultiLineString') return (geometry.coordinates as number[][][]).map(ringOf);
  return [];
}

let basemap: Basemap | null = null;

/** Land and borders, projected on first use. */
export function basemapRings(): Basemap {
  if (basemap) return basemap;
  const topology = countries as unknown as Topology<{ land: GeometryCollection; countries: GeometryCollection }>;
  const landFeature = feature(topology, topology.objects.land) as unknown as { features?: { geometry: { type: string; coordinates: unknown } }[]; geometry?: { type: string; coordinates: unknown } };
  const land = (landFeature.features ?? [landFeature as { geometry: { type: string; coordinates: unknown } }]).flatMap((f) => ringsOf(f.geometry));
  const borders = ringsOf(mesh(topology, topology.objects.countries, (a, b) => a !== b) as unknown as { type: string; coordinates: unknown });
  return (basemap = { land, borders });
}

function trace(ctx: ShapeContext, rings: Ring[], t: ViewTransform, view: ViewBox, close: boolean): void {
  ctx.beginPath();
  for (const ring of rings) {
    if (ring.north < view.south || ring.south > view.north || ring.east < view.west || ring.west > view.east) continue;
    const xy = ring.xy;
    let lastX = t.sx * xy[0] + t.ox;
    let lastY = t.sy * xy[1] + t.oy;
    ctx.moveTo(lastX, lastY);
    for (let i = 2; i < xy.length; i += 2) {
      const x = t.sx * xy[i] + t.ox;
      const y = t.sy * xy[i + 1] + t.oy;
      // Points under a pixel from the last one drawn add nothing but raster work.
      if (i < xy.length - 2 && Math.abs(x - lastX) < 0.7 && Math.abs(y - lastY) < 0.7) continue;
      ctx.lineTo(x, y);
      lastX = x;
      lastY = y;
    }
    if (close) ctx.closePath();
  }
}

/** Fills the land and strokes the borders that meet `view`. */
export function paintBasemap(ctx: ShapeContext, t: ViewTransform, view: ViewBox, rings: Basemap = basemapRings()): void {
  trace(ctx, rings.land, t, view, true);
  ctx.fillStyle = LAND;
  ctx.fill('evenodd');
  trace(ctx, rings.borders, t, view, false);
  ctx.strokeStyle = BORDER.color;
  ctx.lineWidth = BORDER.weight;
  ctx.lineJoin = 'round';
  ctx.stroke();
}
