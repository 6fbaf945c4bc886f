// Hand-written validators for every IPC request, run by main before any work: exact fields, exact
// types, sane sizes. Anything else is refused with IpcPayloadError naming the channel and field.

import type { ChannelName, RequestOf } from './contract';
import { checkBoolean, checkChoice, checkObject, checkOptionalText, checkText, FieldCheckFailure } from '../../engine/index';
import { checkWorkspace } from '../../engine/index';
import { WorkspaceFormatError } from '../../engine/index';
import { ScenarioFormatError } from '../../engine/index';
import { parseScenarioDocument } from '../../engine/index';
import { IpcPayloadError } from '../electron/errors';

/** Longest path accepted over IPC (Windows long paths). */
export const MAX_IPC_PATH = 32_767;
/** Largest export text (UTF-16 code units); far above 50,000 lanes of CSV. */
export const MAX_EXPORT_CHARS = 512 * 1024 * 1024;

type Validators = { [C in ChannelName]: (payload: unknown) => RequestOf<C> };

const VALIDATORS: Validators = {
  'workspace:open': (p) => {
    const o = checkObject(p, '', ['path']);
    return { path: checkOptionalText(o.path, '/path', MAX_IPC_PATH) };
  },
  'workspace:save': (p) => {
    const o = checkObject(p, '', ['document', 'path', 'saveAs']);
    return {
      document: checkDocument(o.document),
      path: checkOptionalText(o.path, '/path', MAX_IPC_PATH),
      saveAs: checkBoolean(o.saveAs, '/saveAs'),
    };
  },
  'workspace:recent': (p) => (checkObject(p, '', []), {}),
  'file:pick-and-read': (p) => {
    const o = checkObject(p, '', ['kind']);
    return { kind: checkChoice(o.kind, '/kind', ['depots', 'lanes', 'scenario', 'loads', 'vehicles'] as const) };
  },
  'file:read': (p) => {
    const o = checkObject(p, '', ['path']);
    return { path: checkText(o.path, '/path', MAX_IPC_PATH) };
  },
  'file:save-export': (p) => {
    const o = checkObject(p, '', ['suggestedName', 'text', 'kind']);
    const suggestedName = checkText(o.suggestedName, '/suggestedName', 255);
    if (/[/\\:*?"<>|]/.test(suggestedName) || suggestedName === '.' || suggestedName === '..') {
      throw new FieldCheckFailure('/suggestedName', JSON.stringify(suggestedName), 'must be a plain file name without folders or reserved characters');
    }
    if (typeof o.text !== 'string') throw new FieldCheckFailure('/text', typeof o.text, 'must be text');
    if (o.text.length > MAX_EXPORT_CHARS) throw new FieldCheckFailure('/text', `${o.text.length} characters`, `longer than ${MAX_EXPORT_CHARS} characters`);
    const kind = checkChoice(o.kind, '/kind', ['csv', 'geojson', 'scenario', 'html'] as const);
    if (kind === 'scenario') checkScenarioText(o.text);
    return { suggestedName, text: o.text, kind };
  },
  'app:set-dirty': (p) => {
    const o = checkObject(p, '', ['dirty']);
    return { dirty: checkBoolean(o.dirty, '/dirty') };
  },
  'app:info': (p) => (checkObject(p, '', []), {}),
};

// A scenario export must be a file `lanewright compare --scenario` can read back.
function checkScenarioText(text: string): void {
  try {
    parseScenarioDocument(text, 'ipc');
  } catch (error) {
    if (error instanceof ScenarioFormatError) {
      throw new FieldCheckFailure('/text', error.value ?? '(document)', `not a scenario document: ${error.path === '' ? '' : `field "${error.path}" `}${error.reason}`);
    }
    throw error;
  }
}

function checkDocument(value: unknown) {
  try {
    return checkWorkspace(value, 'ipc');
  } catch (error) {
    if (error instanceof WorkspaceFormatError) {
      throw new FieldCheckFailure(`/document${error.field}`, error.value, error.reason);
    }
    throw error;
  }
}

/** The request of `channel` checked and copied (only known fields survive); throws IpcPayloadError. */
export function validateRequest<C extends ChannelName>(channel: C, payload: unknown): RequestOf<C> {
  try {
    return (VALIDATORS[channel] as (p: unknown) => RequestOf<C>)(payload);
  } catch (error) {
    if (error instanceof FieldCheckFailure) throw new IpcPayloadError(channel, error.field, error.value, error.reason);
    throw error;
  }
}
