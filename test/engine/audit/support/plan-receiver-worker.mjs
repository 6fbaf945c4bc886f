// A worker thread that takes headroom plans as events, as the app's Web Workers do
// (renderer/worker/headroom.worker.ts): loads the TypeScript sources through tsx.

const { register } = await import('tsx/esm/api');
register();
await import('./plan-receiver-worker.ts');
