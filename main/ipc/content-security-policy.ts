// The Content-Security-Policy of the app's pages, in one place: main sends it as a response header
// for every app resource, and the renderer build may repeat it as a <meta> tag so `npm run web`
// and the browser tests run under the same policy as the desktop window. Pure data.

/** Directives, in the order they are written. */
export const CSP_DIRECTIVES: ReadonlyArray<readonly [string, string]> = [
  ['default-src', "'self'"],
  ['script-src', "'self'"],
  // No 'unsafe-inline': Leaflet and React position panes and markers through the style property
  // (CSSOM), which the policy allows; what it refuses is a style attribute or <style> element in
  // markup, which is how injected HTML would restyle the page. Tooltips get DOM text nodes.
  ['style-src', "'self'"],
  ['img-src', "'self' data: blob:"],
  ['font-src', "'self' data:"],
  ['connect-src', "'self'"],
  ['worker-src', "'self' blob:"],
  ['object-src', "'none'"],
  ['frame-src', "'none'"],
  ['base-uri', "'none'"],
  ['form-action', "'none'"],
];

/** The policy as one header value. `frame-ancestors` only works as a header, so it is added there. */
export const CONTENT_SECURITY_POLICY = [...CSP_DIRECTIVES, ['frame-ancestors', "'none'"] as const].map(([name, value]) => `${name} ${value}`).join('; ');

/** The same policy for a <meta http-equiv="Content-Security-Policy"> tag (no frame-ancestors). */
export const CONTENT_SECURITY_POLICY_META = CSP_DIRECTIVES.map(([name, value]) => `${name} ${value}`).join('; ');
