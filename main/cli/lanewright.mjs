#!/usr/bin/env node
// Entry point of the `lanewright` command. Runs the prebuilt bundle in dist/cli (built by the
// `prepare` script on npm install and npm ci, or `npm run build:cli`) while it is fresh; when it is
// missing or a source is newer (a developer's edit), loads the TypeScript sources through tsx.

import { fileURLToPath, pathToFileURL } from 'node:url';
import { freshBundle } from './fresh-bundle.mjs';

const root = fileURLToPath(new URL('../../', import.meta.url));
const bundle = freshBundle(root, fileURLToPath(new URL('../../dist/cli/', import.meta.url)));
let main;
if (bundle) {
  ({ main } = await import(pathToFileURL(bundle).href));
} else {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('./run.ts'));
}
process.exitCode = await main(process.argv.slice(2));
