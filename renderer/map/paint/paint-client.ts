// The UI thread's side of the paint worker: one worker for the app, started on first use. A
// network's arrays are copied to it once (while any canvas shows that network), a canvas is
// transferred once, and from then on the map sends frames and gets back what was painted.

import type { NetworkView } from '../../worker/protocol';
import { copyPaintArrays, paintBuffers } from './paint-arrays';
import type { CanvasContent, FromPaint, NetworkPaintArrays, PaintedAnswer, PaintFrame, ToPaint } from './protocol';

export type { AddedLaneEnds, CanvasContent, PaintedAnswer, PaintFrame } from './protocol';

/** Whether canvases can be painted off the UI thread here (Electron and Chromium: yes). */
export function offscreenPaintAvailable(): boolean {
  return typeof Worker !== 'undefined' && typeof OffscreenCanvas !== 'undefined' && typeof HTMLCanvasElement !== 'undefined' && 'transferControlToOffscreen' in HTMLCanvasElement.prototype;
}

type OnPainted = (answer: PaintedAnswer) => void;

class PaintClient {
  private worker: Worker | null = null;
  private nextId = 1;
  private readonly networkIds = new WeakMap<NetworkView, { id: number; users: number }>();
  private readonly listeners = new Map<number, { network: NetworkView | null; onPainted: OnPainted }>();

  private send(message: ToPaint, transfer: Transferable[] = []): void {
    if (!this.worker) {
      this.worker = new Worker(new URL('./paint.worker.ts', import.meta.url), { type: 'module', name: 'lanewright-paint' });
      this.worker.onmessage = (event: MessageEvent<FromPaint>) => {
        const message = event.data;
        if (message.kind === 'painted') this.listeners.get(message.canvas)?.onPainted(message);
      };
    }
    this.worker.postMessage(message, transfer);
  }

  /** The network's id in the worker, sending its arrays the first time (copies: the UI keeps its own). */
  private use(network: NetworkView): number {
    let entry = this.networkIds.get(network);
    if (!entry) {
      entry = { id: this.nextId++, users: 0 };
      this.networkIds.set(network, entry);
      const arrays = paintArraysOf(network);
      this.send({ kind: 'network', network: entry.id, arrays }, paintBuffers(arrays));
    }
    entry.users++;
    return entry.id;
  }

  private release(network: NetworkView): void {
    const entry = this.networkIds.get(network);
    if (!entry || --entry.users > 0) return;
    this.networkIds.delete(network);
    this.send({ kind: 'drop-network', network: entry.id });
  }

  /** Hands `canvas` to the worker (it cannot be drawn on from this thread afterwards); returns its id. */
  open(canvas: HTMLCanvasElement, network: NetworkView | null, content: CanvasContent, onPainted: OnPainted): number {
    const id = this.nextId++;
    const target = canvas.transferControlToOffscreen();
    const networkId = network ? this.use(network) : null;
    this.listeners.set(id, { network, onPainted });
    this.send({ kind: 'open', canvas: id, target, network: networkId, content }, [target]);
    return id;
  }

  content(canvas: number, content: CanvasContent): void {
    this.send({ kind: 'content', canvas, content });
  }

  frame(canvas: number, frame: PaintFrame): void {
    this.send({ kind: 'frame', canvas, frame });
  }

  close(canvas: number): void {
    const listener = this.listeners.get(canvas);
    if (!listener) return;
    this.listeners.delete(canvas);
    this.send({ kind: 'close', canvas });
    if (listener.network) this.release(listener.network);
  }
}

/**
 * Arrays to transfer to the worker: the copies the engine worker made for it (`NetworkView.paint`,
 * handed on without copying; they are empty once transferred), else copies made here. A structured
 * clone of the 8 MB held the UI thread for about 100 ms on a loaded machine, the copies here 60 ms.
 */
const handedOn = new WeakSet<NetworkView>();
function paintArraysOf(network: NetworkView): NetworkPaintArrays {
  if (network.paint && !handedOn.has(network)) {
    handedOn.add(network);
    return network.paint;
  }
  return copyPaintArrays(network);
}

let client: PaintClient | null = null;

/** The app's paint worker client. */
export function paintClient(): PaintClient {
  return (client ??= new PaintClient());
}
