// Builds the renderer (React UI + engine Web Worker) into dist/renderer. Relative base so the
// Electron window can loadFile() it and the browser mode can serve it from any folder.
import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import { CONTENT_SECURITY_POLICY_META } from './main/ipc/content-security-policy';
import { CROSS_ORIGIN_ISOLATION_HEADERS } from './main/ipc/cross-origin-isolation';

// The page carries the same policy main sends as a header, so browser mode runs under it too.
const contentSecurityPolicy: Plugin = {
  name: 'lanewright-csp',
  transformIndexHtml: (html) => html.replace('%LANEWRIGHT_CSP%', CONTENT_SECURITY_POLICY_META),
};

export default defineConfig({
  root: 'renderer',
  base: './',
  plugins: [react(), contentSecurityPolicy],
  build: {
    outDir: '../dist/renderer',
    emptyOutDir: true,
    sourcemap: true,
    chunkSizeWarningLimit: 2000,
  },
  worker: { format: 'es' },
  // Isolated as the served app and the desktop window are, so the headroom workers run in development too.
  server: { port: 5178, strictPort: false, headers: { ...CROSS_ORIGIN_ISOLATION_HEADERS } },
  preview: { headers: { ...CROSS_ORIGIN_ISOLATION_HEADERS } },
});
