// Registers one ipcMain handler per contract channel. Each call is checked in this order: the
// sender must be the app's own top-level page, the payload must match the contract, and only then
// does the host service run. Failures come back as HostFailure data, never as thrown errors.

import type { IpcMain, IpcMainInvokeEvent } from 'electron';
import { CHANNEL_NAMES } from '../ipc/channels';
import type { ChannelName, HostFailure, WireResponse } from '../ipc/contract';
import { validateRequest } from '../ipc/validate-request';
import { LanewrightError } from '../../engine/index';
import { isAppPageUrl } from './app-page';
import { IpcPayloadError, IpcSenderError } from './errors';
import type { createHostService } from './host-service';

/** The parts of an invoke event the sender check reads. */
export type SenderEvent = { senderFrame: Pick<NonNullable<IpcMainInvokeEvent['senderFrame']>, 'url' | 'parent'> | null };

/** Throws IpcSenderError unless the event comes from the app page's top-level frame. */
export function checkSender(channel: string, event: SenderEvent): void {
  const frame = event.senderFrame;
  if (frame === null) throw new IpcSenderError(channel, null);
  if (frame.parent !== null || !isAppPageUrl(frame.url)) throw new IpcSenderError(channel, frame.url);
}

/** Turns any error into the HostFailure the renderer receives. */
export function toFailure(error: unknown): HostFailure {
  if (error instanceof LanewrightError) {
    const fields = error as unknown as Record<string, unknown>;
    const pathLike = fields.path ?? fields.source ?? fields.file ?? null;
    const field = fields.field ?? null;
    return {
      error: error.name,
      message: error.message,
      path: typeof pathLike === 'string' ? pathLike : null,
      field: typeof field === 'string' ? field : null,
    };
  }
  // Not one of ours: report the kind of failure without internals.
  return { error: 'InternalError', message: `unexpected failure: ${error instanceof Error ? error.message : String(error)}`, path: null, field: null };
}

/** Handles one invoke: sender, arguments, payload, then the service. */
export async function handleInvoke<C extends ChannelName>(
  channel: C,
  service: ReturnType<typeof createHostService>,
  event: SenderEvent,
  args: unknown[],
): Promise<WireResponse<C>> {
  try {
    checkSender(channel, event);
    if (args.length !== 1) throw new IpcPayloadError(channel, '', `${args.length} arguments`, 'expected exactly one request object');
    const request = validateRequest(channel, args[0]);
    const run = service[channel] as (r: typeof request) => Promise<WireResponse<C> extends { ok: true; value: infer V } ? V : never>;
    return { ok: true, value: await run(request) } as WireResponse<C>;
  } catch (error) {
    return { ok: false, failure: toFailure(error) };
  }
}

/** Registers every channel on `ipcMain`; returns a function that removes them again. */
export function registerIpcHandlers(ipcMain: Pick<IpcMain, 'handle' | 'removeHandler'>, service: ReturnType<typeof createHostService>): () => void {
  for (const channel of CHANNEL_NAMES) {
    ipcMain.handle(channel, (event, ...args) => handleInvoke(channel, service, event, args));
  }
  return () => {
    for (const channel of CHANNEL_NAMES) ipcMain.removeHandler(channel);
  };
}
