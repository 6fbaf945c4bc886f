// Chooses the host: the preload's `window.lanewright` under Electron, the browser host otherwise.
// The UI only ever sees the contract's LanewrightHost, so every component runs in both.

import type { LanewrightHost } from '../../main/ipc/contract';
import { createBrowserHost } from './browser-host';

/** The desktop host the preload defined, if any. */
function desktopHost(): LanewrightHost | null {
  const candidate = (window as unknown as { lanewright?: LanewrightHost }).lanewright;
  return candidate && candidate.kind === 'desktop' ? candidate : null;
}

/** The host for this window. */
export function pickHost(version: string): LanewrightHost {
  return desktopHost() ?? createBrowserHost(version);
}
