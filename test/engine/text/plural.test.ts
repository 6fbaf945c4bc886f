// Counts in words: "1 warning", "2 warnings", never "1 warning(s)"; messages built with the helper
// say so too (a one-row file, a check with one warning).

import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { counted, formatReport, importNetwork, plural } from '../../../engine/index';
import { runCli, tempFiles } from '../../main/cli/cli-harness';

describe('counts in words', () => {
  it('uses the singular for exactly one and the plural otherwise', () => {
    expect(counted(1, 'warning')).toBe('1 warning');
    expect(counted(0, 'warning')).toBe('0 warnings');
    expect(counted(2, 'warning')).toBe('2 warnings');
    expect(counted(1, 'vehicle class', 'vehicle classes')).toBe('1 vehicle class');
    expect(counted(3, 'vehicle class', 'vehicle classes')).toBe('3 vehicle classes');
    expect(plural(1, 'is', 'are')).toBe('is');
    expect(plural(5, 'is', 'are')).toBe('are');
  });

  it('the import report and lanewright check say "1 row" and "1 warning"', async () => {
    const depots = 'id,name,lat,lon\nA,Alpha,51,4\nB,Bravo,52,4\n';
    const lanes = 'from,to,toll,fuel,rebate\nA,B,1.00,2.00,-1.00\n';
    const lines = formatReport(importNetwork(depots, lanes, { plan: { date: '2026-06-01' } }).report);
    expect(lines.join('\n')).toMatch(/lanes\.csv: 1 row, 1 accepted, 0 rejected/);
    const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
    const run = await runCli(['check', '--date', '2026-06-01', '--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv')]);
    expect(run.stdout + run.stderr).toMatch(/total 3 rows: 3 accepted, 0 rejected; 0 errors, 1 warning\b/);
    expect(run.stdout + run.stderr).not.toMatch(/\(s\)/);
  });
});
