// GeoJSON (RFC 7946) for GIS tools: depots as points, cheapest routes from an origin and rebate loops
// as line strings, positions in [longitude, latitude] order (RFC 7946 section 3.1.1), WGS 84.

import type { RebateLoop } from '../routes/rebate-loop';
import { formatMinor, type Minor } from '../money/minor';
import type { Network } from '../network/types';
import type { RoutesReport } from '../report/routes-report';
import { ROUTE_CAUTION } from '../text/cautions';
import type { ExportSettings } from './export-settings';

export type Position = [number, number];
export interface Feature {
  type: 'Feature';
  geometry: { type: 'Point'; coordinates: Position } | { type: 'LineString'; coordinates: Position[] };
  properties: Record<string, string | number | boolean | null | string[] | number[]>;
}
/** RFC 7946 section 6.1 allows foreign members: `caution` and `settings` travel with the features. */
export interface FeatureCollection {
  type: 'FeatureCollection';
  features: Feature[];
  /** Always the route caution (costs are estimates; restrictions, hours and regulations apply). */
  caution?: string;
  settings?: ExportSettings;
}

export interface GeoJsonOptions {
  report?: RoutesReport;
  loops?: readonly RebateLoop[];
  /** What the file was made from (date, class, files, scenario). */
  settings?: ExportSettings;
}

/** Depots, plus routes (when a routes report is given) and loops, as one FeatureCollection. */
export function networkGeoJson(network: Network, options: GeoJsonOptions = {}): FeatureCollection {
  const at = (d: number): Position => [network.lon[d], network.lat[d]];
  const byId = (id: string) => network.depotIndex.get(id)!;
  const features: Feature[] = [];
  const routeOf = new Map(options.report?.depots.map((r) => [r.id, r]) ?? []);
  for (let d = 0; d < network.depotCount; d++) {
    const route = routeOf.get(network.depotIds[d]);
    features.push({
      type: 'Feature',
      geometry: { type: 'Point', coordinates: at(d) },
      properties: {
        kind: 'depot',
        id: network.depotIds[d],
        name: network.depotNames[d],
        status: route?.status ?? null,
        cost: route?.cost ?? null,
        currency: network.currency,
      },
    });
  }
  const report = options.report;
  if (report) {
    for (const r of report.depots) {
      if (r.path.length < 2) continue;
      features.push({
        type: 'Feature',
        geometry: { type: 'LineString', coordinates: r.path.map((id) => at(byId(id))) },
        properties: {
          kind: 'route',
          origin: report.origin,
          to: r.id,
          cost: r.cost,
          currency: report.currency,
          legs: r.legs,
          path: r.path,
          lane_rows: r.lanes,
          toll: r.breakdown?.toll ?? null,
          fuel: r.breakdown?.fuel ?? null,
          fees: r.breakdown?.fees ?? null,
          rebate: r.breakdown?.rebate ?? null,
          distance_km: r.breakdown?.distance_km ?? null,
          drive_minutes: r.breakdown?.drive_minutes ?? null,
          over_drive_limit: r.breakdown?.over_drive_limit ?? null,
        },
      });
    }
  }
  (options.loops ?? []).forEach((loop, k) => {
    const ring = [...loop.depots, loop.depots[0]].map(at);
    features.push({
      type: 'Feature',
      geometry: { type: 'LineString', coordinates: ring },
      properties: {
        kind: 'loop',
        loop: k + 1,
        depots: loop.depots.map((d) => network.depotIds[d]),
        lane_rows: loop.lanes.map((e) => network.laneRow[e]),
        refs: loop.lanes.map((e) => network.laneRef[e] ?? ''),
        net_per_lap: formatMinor(loop.netPerLap as Minor, network.exponent),
        currency: network.currency,
      },
    });
  });
  return { type: 'FeatureCollection', features, caution: ROUTE_CAUTION, ...(options.settings ? { settings: options.settings } : {}) };
}
