// Entry of a headroom worker thread when the command runs from its TypeScript sources (development,
// tests): loads them through tsx, as main/cli/lanewright.mjs does when the bundle is stale.

const { register } = await import('tsx/esm/api');
register();
await import('./worker.ts');
