// `npm run web`: serves the built renderer (dist/renderer) on localhost for machines without the
// desktop runtime. The port comes from the PORT environment variable (default 5178).

import { existsSync } from 'node:fs';
import { serveStatic } from './static-server';

const DEFAULT_PORT = 5178;
const root = 'dist/renderer';
const port = process.env.PORT ? Number(process.env.PORT) : DEFAULT_PORT;

if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`PORT must be a whole number 0..65535, got "${process.env.PORT}"`);
  process.exit(2);
}
if (!existsSync(`${root}/index.html`)) {
  console.error(`${root}/index.html is missing; run "npm run build:renderer" first`);
  process.exit(1);
}
const running = await serveStatic(root, port);
console.log(`Lanewright is served at ${running.url} (offline; press Ctrl+C to stop)`);
