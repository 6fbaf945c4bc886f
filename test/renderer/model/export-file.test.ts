// File names of scenario exports: always a plain name main's IPC validator accepts, ending in .json.

import { describe, expect, it } from 'vitest';
import { validateRequest } from '../../../main/ipc/validate-request';
import { serializeScenarioDocument } from '../../../engine/scenario/document';
import { scenarioFileName } from '../../../renderer/model/export-file';

describe('scenarioFileName', () => {
  it('keeps letters and digits, folds accents, and drops folders and reserved characters', () => {
    expect(scenarioFileName('Direct Milan run')).toBe('direct-milan-run.json');
    expect(scenarioFileName('Zürich / Genève: Q3 "what-if"')).toBe('zurich-geneve-q3-what-if.json');
    expect(scenarioFileName('..\\..\\etc')).toBe('etc.json');
    expect(scenarioFileName('   ')).toBe('scenario.json');
    expect(scenarioFileName('x'.repeat(300))).toHaveLength(85);
  });

  it('gives names the host accepts for a scenario export', () => {
    const text = serializeScenarioDocument({ name: 'n', description: null, changes: [] });
    for (const name of ['What-if 1', 'a/b', 'C:evil', '<>|?*', 'ŽŽŽ', '.hidden']) {
      expect(validateRequest('file:save-export', { suggestedName: scenarioFileName(name), text, kind: 'scenario' }).suggestedName).toMatch(/^[a-z0-9._-]+\.json$/);
    }
  });
});
