// The command line never prints a file's control characters raw: messages on stderr always escape
// them; stdout escapes them only when it is a terminal (a pipe or --out gets the data unchanged).

import { describe, expect, it } from 'vitest';
import { forStdout } from '../../../main/cli/terminal-text';
import { runCli, tempFiles } from './cli-harness';
import { join } from 'node:path';

const ESC = '\u001b';

describe('terminal output', () => {
  it('check and routes print no raw control character from the files or the command line', async () => {
    const dir = tempFiles({
      'depots.csv': `id,name,lat,lon\nA,Alpha${ESC}]0;owned\u0007,51,4\nB,b,52,4\n`,
      'lanes.csv': `from,to,toll,fuel,fees,rebate,notes${ESC}[2J\nA,B,1.00,2.00,0,0,x\nA,B,${ESC}[2J${'9'.repeat(300)},2.00,0,0,y\n`,
    });
    const files = ['--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--date', '2026-06-01'];
    const check = await runCli(['check', ...files]);
    expect(check.status).toBe(1);
    for (const text of [check.stdout, check.stderr]) expect(text).not.toContain(ESC);
    expect(check.stdout).toContain('\\x1b[2J');
    // The 300-digit value is cut with an ellipsis.
    expect(check.stdout).toMatch(/value "\\x1b\[2J9{76}…"/);
    const routes = await runCli(['routes', ...files, '--skip-invalid', '--from', `A${ESC}[2J`]);
    expect(routes.stderr).not.toContain(ESC);
    expect(routes.stderr).toContain('\\x1b[2J');
  });

  it('stdout is escaped for a terminal only', () => {
    const csv = `id,name\r\nA,x${ESC}[31m\tred\r\n`;
    expect(forStdout(csv, false)).toBe(csv);
    expect(forStdout(csv, true)).toBe('id,name\nA,x\\x1b[31m\tred\n');
  });
});
