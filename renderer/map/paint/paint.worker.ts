// Entry point of the paint worker: the lane canvases of the map are painted here on
// OffscreenCanvases, so rasterising tens of thousands of lines (in software when there is no GPU)
// never holds the UI thread. State and painting are paint-scene.ts; messages are protocol.ts.

import { PaintScene } from './paint-scene';
import type { FromPaint, ToPaint } from './protocol';

const scope = self as unknown as { postMessage(message: FromPaint, transfer: Transferable[]): void; onmessage: ((event: MessageEvent<ToPaint>) => void) | null };
const scene = new PaintScene(
  (message) => scope.postMessage(message, message.kind === 'painted' && message.shown ? [message.shown.buffer] : []),
  (run) => setTimeout(run, 0),
);
scope.onmessage = (event) => scene.handle(event.data);
