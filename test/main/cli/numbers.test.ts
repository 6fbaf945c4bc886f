// A lane whose net cost leaves the exact range: `check` prints its report with the row error (it
// printed nothing and aborted), routes refuses naming the row, and --skip-invalid plans without it.

import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, tempFiles } from './cli-harness';

describe('overflowing lanes on the command line', () => {
  const dir = tempFiles({
    'depots.csv': 'id,name,lat,lon\nA,a,51,4\nB,b,52,4\nC,c,53,4\n',
    'lanes.csv': 'from,to,toll,fuel,fees,rebate\nA,B,90071992547409.91,90071992547409.91,0,0\nA,C,1.00,2.00,0,-3.00\n',
  });
  const files = ['--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--date', '2026-06-01'];

  it('check reports the row and exits 1', async () => {
    const r = await runCli(['check', ...files, '--json']);
    expect(r.status).toBe(1);
    const report = JSON.parse(r.stdout);
    expect(report.errors.map((e: { row: number; code: string }) => [e.row, e.code])).toEqual([[2, 'amount-overflow']]);
    expect(report.warnings.map((w: { row: number; column: string; code: string }) => [w.row, w.column, w.code])).toEqual([[3, 'rebate', 'negative-amount']]);
    expect(report.accepted + report.rejected).toBe(report.total);
  });

  it('routes refuses with the row named; --skip-invalid plans the rest', async () => {
    const refused = await runCli(['routes', ...files, '--from', 'A']);
    expect(refused.status).toBe(1);
    expect(refused.stderr).toContain('row 2');
    const skipped = await runCli(['routes', ...files, '--from', 'A', '--skip-invalid', '--json']);
    expect(skipped.status).toBe(0);
    const byId = Object.fromEntries(JSON.parse(skipped.stdout).depots.map((d: { id: string }) => [d.id, d]));
    expect(byId.B.status).toBe('unreachable');
    // 1.00 + 2.00 - (-3.00): the negative rebate raises the cost, as the warning says.
    expect(byId.C.cost).toBe('6.00');
  });
});
