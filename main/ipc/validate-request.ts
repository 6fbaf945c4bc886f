// Hand-written validators for every IPC request, run by main before any work: exact fields, exact
// types, sane sizes. Anything else is refused with IpcPayloadError naming the channel and field.

import type { ChannelName, RequestOf } from './contract';
import { checkJson, json, JsonCheckFailure } from '../../engine/index';
import { checkWorkspace } from '../../engine/index';
import { WorkspaceFormatError } from '../../engine/index';
import { ScenarioFormatError } from '../../engine/index';
import { parseScenarioDocument } from '../../engine/index';
import { IpcPayloadError } from '../electron/errors';

/** Longest path accepted over IPC (Windows long paths). */
export const MAX_IPC_PATH = 32_767;
/** Largest export text (UTF-16 code units); far above 50,000 lanes of CSV. */
export const MAX_EXPORT_CHARS = 512 * 1024 * 1024;

const NO_FIELDS = json.object({});

// A plain file name: no folders, no characters a file system reserves.
const fileName = json.text(255).refine((name) => !/[/\\:*?"<>|]/.test(name) && name !== '.' && name !== '..', {
  error: 'must be a plain file name without folders or reserved characters',
});

/** The payload schema of each channel (the workspace document is checked by its own reader). */
const SCHEMAS = {
  'workspace:open': json.object({ path: json.nullable(json.text(MAX_IPC_PATH)) }),
  'workspace:save': json.object({ document: json.anything(), path: json.nullable(json.text(MAX_IPC_PATH)), saveAs: json.boolean() }),
  'workspace:recent': NO_FIELDS,
  'file:pick-and-read': json.object({ kind: json.choice(['depots', 'lanes', 'scenario', 'loads', 'vehicles']) }),
  'file:read': json.object({ path: json.text(MAX_IPC_PATH) }),
  'file:save-export': json.object({
    suggestedName: fileName,
    text: json.anyText(MAX_EXPORT_CHARS),
    kind: json.choice(['csv', 'geojson', 'scenario', 'html']),
  }),
  'app:set-dirty': json.object({ dirty: json.boolean() }),
  'app:info': NO_FIELDS,
} as const;

type Validators = { [C in ChannelName]: (payload: unknown) => RequestOf<C> };

const VALIDATORS: Validators = {
  'workspace:open': (p) => checkJson(SCHEMAS['workspace:open'], p),
  'workspace:save': (p) => {
    const o = checkJson(SCHEMAS['workspace:save'], p);
    return { ...o, document: checkDocument(o.document) };
  },
  'workspace:recent': (p) => checkJson(SCHEMAS['workspace:recent'], p),
  'file:pick-and-read': (p) => checkJson(SCHEMAS['file:pick-and-read'], p),
  'file:read': (p) => checkJson(SCHEMAS['file:read'], p),
  'file:save-export': (p) => {
    const o = checkJson(SCHEMAS['file:save-export'], p);
    if (o.kind === 'scenario') checkScenarioText(o.text);
    return o;
  },
  'app:set-dirty': (p) => checkJson(SCHEMAS['app:set-dirty'], p),
  'app:info': (p) => checkJson(SCHEMAS['app:info'], p),
};

// A scenario export must be a file `lanewright compare --scenario` can read back.
function checkScenarioText(text: string): void {
  try {
    parseScenarioDocument(text, 'ipc');
  } catch (error) {
    if (error instanceof ScenarioFormatError) {
      throw new JsonCheckFailure('/text', error.value ?? '(document)', `not a scenario document: ${error.path === '' ? '' : `field "${error.path}" `}${error.reason}`);
    }
    throw error;
  }
}

function checkDocument(value: unknown) {
  try {
    return checkWorkspace(value, 'ipc');
  } catch (error) {
    if (error instanceof WorkspaceFormatError) {
      throw new JsonCheckFailure(`/document${error.field}`, error.value, error.reason);
    }
    throw error;
  }
}

/** The request of `channel` checked and copied (only known fields survive); throws IpcPayloadError. */
export function validateRequest<C extends ChannelName>(channel: C, payload: unknown): RequestOf<C> {
  try {
    return (VALIDATORS[channel] as (p: unknown) => RequestOf<C>)(payload);
  } catch (error) {
    if (error instanceof JsonCheckFailure) throw new IpcPayloadError(channel, error.pointer, error.value, error.reason);
    throw error;
  }
}
