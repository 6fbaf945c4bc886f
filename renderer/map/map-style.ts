// Line and marker styles of the network map. Every state differs in more than colour: width, dash
// pattern, marker shape and a text label, so the map reads for colour-blind users and in print.

export const STYLE = {
  lane: { color: '#8d9aa0', weight: 1, opacity: 0.55 },
  tree: { color: '#1d5f86', weight: 3, opacity: 0.85, lineCap: 'butt', lineJoin: 'miter' },
  route: { color: '#111111', weight: 7, opacity: 0.9 },
  routeInner: { color: '#f2b233', weight: 4, opacity: 1 },
  loop: { color: '#a3123a', weight: 6, opacity: 0.95, dashArray: '12 8' },
  // Lanes a scenario adds: round dots over a white casing, and always a text label.
  addedCasing: { color: '#ffffff', weight: 6, opacity: 0.8 },
  added: { color: '#5b2a86', weight: 4, opacity: 1, dashArray: '0.1 8', lineCap: 'round' },
  depot: { radius: 4, color: '#33434a', weight: 1, fillColor: '#ffffff', fillOpacity: 1 },
  reachable: { radius: 5, color: '#1d5f86', weight: 2, fillColor: '#d9ecf5', fillOpacity: 1 },
  unreachable: { radius: 4, color: '#77858b', weight: 1, fillColor: '#d0d4d6', fillOpacity: 1, dashArray: '2 2' },
  origin: { radius: 9, color: '#111111', weight: 3, fillColor: '#f2b233', fillOpacity: 1 },
  selected: { radius: 8, color: '#111111', weight: 3, fillColor: '#ffffff', fillOpacity: 1 },
} as const;

/** Above this many unbounded depots the diamond markers (DOM elements) give way to canvas rings. */
export const MAX_DIAMONDS = 400;
