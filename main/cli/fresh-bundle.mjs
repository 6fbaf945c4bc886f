// Whether the prebuilt bundle of the command (dist/cli, main/build/build-cli.ts) may run: it must
// exist and no source it was built from may have changed since its build started. Plain JavaScript,
// because it runs before anything that could compile TypeScript.

import { readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

/**
 * The bundle's entry file in `bundleDir` when it is fresh, else null (no bundle, an unreadable
 * manifest, or a source file newer than the build or gone). `root` is the repository root the
 * manifest's paths are relative to.
 * @param {string} root
 * @param {string} bundleDir
 * @returns {string | null}
 */
export function freshBundle(root, bundleDir) {
  try {
    const manifest = JSON.parse(readFileSync(join(bundleDir, 'inputs.json'), 'utf8'));
    const entry = join(bundleDir, manifest.entry);
    statSync(entry);
    for (const input of manifest.inputs) {
      if (statSync(join(root, input)).mtimeMs > manifest.builtAt) return null;
    }
    return entry;
  } catch {
    return null;
  }
}
