// Named errors of the desktop host's IPC layer. They travel back to the renderer as HostFailure
// data (class name, message, path, field), so the renderer can say exactly what was refused.

import { LanewrightError } from '../../engine/index';

/** An IPC call from a frame that is not the app's own page (a subframe, a navigated or foreign page). */
export class IpcSenderError extends LanewrightError {
  constructor(
    readonly channel: string,
    /** URL of the sending frame, or null when the frame is gone. */
    readonly senderUrl: string | null,
  ) {
    super(`ipc ${channel}: refused a call from ${senderUrl === null ? 'a frame that no longer exists' : `"${senderUrl}"`}; only the Lanewright window may call the host`);
  }
}

/** An IPC payload that does not match the contract (unknown channel, wrong type, unknown field). */
export class IpcPayloadError extends LanewrightError {
  constructor(
    readonly channel: string,
    /** JSON pointer of the offending field ('' = the whole payload). */
    readonly field: string,
    readonly value: string | null,
    readonly reason: string,
  ) {
    super(`ipc ${channel}: ${field === '' ? 'payload' : `field ${field}`}${value === null ? '' : ` value ${value}`}: ${reason}`);
  }
}

/** A path the renderer asked to read or overwrite that the user never chose. */
export class FileGrantError extends LanewrightError {
  constructor(
    readonly path: string,
    readonly operation: 'read' | 'write' | 'open',
  ) {
    super(`${path}: cannot ${operation}: this file was not chosen in a dialog or named by the open workspace`);
  }
}
