// Two-way lanes drawn as two lines side by side: a lane u->v whose reverse v->u exists is shifted a
// few screen pixels to the right of its direction of travel, so a loop between two depots shows both
// directions instead of one line drawn twice. The shift is applied after Leaflet projects the
// segments to pixels, so it stays the same width at every zoom level.

import L from 'leaflet';
import { shiftRings } from './two-way';

// Leaflet's projection step is not in its type declarations; `_rings` holds one pixel ring per segment.
interface Projected {
  _rings: L.Point[][];
  _project(): void;
}
const projectPolyline = (L.Polyline.prototype as unknown as Projected)._project;

/** A multi-line whose segments (two points each) are shifted sideways by `offsets[i]` pixels. */
export const OffsetLines = L.Polyline.extend({
  _project(this: L.Polyline & Projected & { options: { lwOffsets?: ArrayLike<number> } }) {
    projectPolyline.call(this);
    const offsets = this.options.lwOffsets;
    if (offsets) shiftRings(this._rings, offsets);
  },
}) as unknown as new (segments: L.LatLngExpression[][], options: L.PolylineOptions & { lwOffsets: ArrayLike<number> }) => L.Polyline;
