// The response headers that make the app's page cross-origin isolated (`crossOriginIsolated`), in
// one place for both hosts (main/web/static-server.ts, main/electron/app-protocol.ts): only an
// isolated page may create SharedArrayBuffers, which the app's headroom workers share
// (renderer/worker/headroom-pool.ts). Every resource the app loads is its own (scripts, workers,
// the bundled basemap; downloads are blob: navigations), so embedding only resources that consent
// costs nothing. Pure data.

/** Sent with every response of the app's origin, page and subresources alike. */
export const CROSS_ORIGIN_ISOLATION_HEADERS: Readonly<Record<string, string>> = Object.freeze({
  // The page shares no browsing context group with a page of another origin.
  'Cross-Origin-Opener-Policy': 'same-origin',
  // Every subresource must consent to being embedded (CORP or CORS); the app's own all do.
  'Cross-Origin-Embedder-Policy': 'require-corp',
  // The app's files may be embedded by its own origin only.
  'Cross-Origin-Resource-Policy': 'same-origin',
});
