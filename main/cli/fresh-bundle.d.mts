// Types of fresh-bundle.mjs (plain JavaScript, run before TypeScript can be compiled).

/** The bundle's entry file when the bundle in `bundleDir` is fresh, else null. */
export function freshBundle(root: string, bundleDir: string): string | null;
