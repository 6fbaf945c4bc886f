// The channel names of the contract as a runtime list, for main (which registers a handler per
// channel) and the preload. The type check below fails when the contract gains a channel not listed.

import type { ChannelName } from './contract';

/** Every channel of the contract, once. */
export const CHANNEL_NAMES = [
  'workspace:open',
  'workspace:save',
  'workspace:recent',
  'file:pick-and-read',
  'file:read',
  'file:save-export',
  'app:set-dirty',
  'app:info',
] as const satisfies readonly ChannelName[];

type Missing = Exclude<ChannelName, (typeof CHANNEL_NAMES)[number]>;
// If this line fails to compile, a channel of the contract is missing from CHANNEL_NAMES.
const everyChannelListed: Missing extends never ? true : Missing = true;
void everyChannelListed;

/** True when `name` is a channel of the contract. */
export function isChannelName(name: unknown): name is ChannelName {
  return typeof name === 'string' && (CHANNEL_NAMES as readonly string[]).includes(name);
}
