// The import rules of eslint.config.js, tried on one-line sources placed at chosen paths: each
// forbidden import is reported, each allowed one is not. `npm run lint` applies the same rules to
// the real tree; this file proves the rules themselves can fail.

import { ESLint } from 'eslint';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const eslint = new ESLint({ cwd: root });

/** Rule ids reported for `source` as if it were the file at `path` (repository-relative). */
async function problems(path: string, source: string): Promise<string[]> {
  const [result] = await eslint.lintText(source, { filePath: root + path });
  return result.messages.map((m) => m.ruleId ?? `fatal: ${m.message}`);
}

describe('lint rules', () => {
  // [file, source, the rule that must report it]
  const forbidden: [string, string, string][] = [
    ['engine/routes/x.ts', "import { auditNetwork } from '../audit/network-audit';", 'boundaries/dependencies'],
    ['engine/money/x.ts', "import type { Network } from '../network/types';", 'boundaries/dependencies'],
    ['engine/network/x.ts', "import { importNetwork } from '../planning/import-network';", 'boundaries/dependencies'],
    ['engine/report/x.ts', "import { lanesCsv } from '../export/lanes-csv';", 'boundaries/dependencies'],
    ['engine/scenario/x.ts', "import { planLoads } from '../dispatch/plan-loads';", 'boundaries/dependencies'],
    ['engine/routes/x.ts', "import { cheapestRoutes } from '../index';", 'boundaries/dependencies'],
    ['engine/routes/x.ts', "import { run } from '../../main/cli/run';", 'boundaries/dependencies'],
    ['engine/brand-new-area/x.ts', "import { ZERO } from '../money/minor';", 'boundaries/dependencies'],
    ['main/cli/x.ts', "import { cheapestRoutes } from '../../engine/routes/cheapest-routes';", 'boundaries/dependencies'],
    ['main/electron/x.ts', "import { App } from '../../renderer/app/App';", 'boundaries/dependencies'],
    ['renderer/app/x.ts', "import { CHANNELS } from '../../main/ipc/contract';", 'boundaries/dependencies'],
    ['renderer/app/x.ts', "import type { RunIo } from '../../main/cli/run';", 'boundaries/dependencies'],
    ['renderer/model/x.ts', "import { laneKeyText } from '../../engine/import/lane-key';", 'boundaries/dependencies'],
    ['engine/routes/x.ts', "import Papa from 'papaparse';", 'no-restricted-imports'],
    ['engine/geo/other.ts', "import * as turf from '@turf/turf';", 'no-restricted-imports'],
    ['engine/scenario/x.ts', "import { z } from 'zod';", 'no-restricted-imports'],
    ['engine/routes/x.ts', "import { readFileSync } from 'node:fs';", 'no-restricted-imports'],
    ['engine/routes/x.ts', "import { join } from 'path';", 'no-restricted-imports'],
    ['renderer/worker/x.ts', "import { Worker } from 'node:worker_threads';", 'no-restricted-imports'],
    ['renderer/app/x.ts', "import L from 'leaflet';", 'no-restricted-imports'],
    ['renderer/app/x.ts', "import { app } from 'electron';", 'no-restricted-imports'],
    ['main/cli/x.ts', "import { app } from 'electron';", 'no-restricted-imports'],
    ['main/cli/x.ts', "import { build } from 'esbuild';", 'no-restricted-imports'],
    ['main/cli/x.ts', "import { useState } from 'react';", 'no-restricted-imports'],
    ['engine/routes/x.ts', "// eslint-disable-next-line no-debugger\ndebugger;", '@eslint-community/eslint-comments/require-description'],
  ];

  it.each(forbidden)('%s: %s is reported', async (path, source, rule) => {
    expect(await problems(path, source)).toContain(rule);
  });

  const allowed: [string, string][] = [
    ['engine/io/csv-papaparse.ts', "import Papa from 'papaparse';"],
    ['engine/geo/turf.ts', "import * as turf from '@turf/turf';"],
    ['engine/audit/x.ts', "import { findNegativeLoop } from '../loops/find-negative-loop';"],
    ['engine/planning/x.ts', "import type { LaneTable } from '../import/types';"],
    ['engine/export/x.ts', "import { routesReportRows } from '../report/routes-report';"],
    ['engine/scenario/x.ts', "import { findDistinctLoops } from '../audit/distinct-loops';"],
    ['engine/dispatch/x.ts', "import { overlayNetwork } from '../scenario/overlay-network';"],
    ['engine/routes/x.ts', "import { MoneyOverflowError } from '../errors';"],
    ['renderer/app/x.ts', "import type { LanewrightHost } from '../../main/ipc/contract';"],
    ['renderer/map/x.ts', "import L from 'leaflet';"],
    ['renderer/app/x.tsx', "import { jsx } from 'react/jsx-runtime';\nexport const A = () => <div />;"],
    ['main/electron/x.ts', "import { app } from 'electron';"],
    ['main/build/x.ts', "import { build } from 'esbuild';"],
    ['main/cli/x.ts', "import { readFileSync } from 'node:fs';\nimport { cheapestRoutes } from '../../engine/index';"],
    ['engine/routes/x.ts', "// eslint-disable-next-line no-debugger -- a reason is given\ndebugger;"],
  ];

  it.each(allowed)('%s: %s is allowed', async (path, source) => {
    expect(await problems(path, source)).toEqual([]);
  });
});
