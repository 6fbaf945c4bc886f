// The command line's option tables: strict parsing with its own message for each kind of mistake,
// help and usage generated from the same tables, --version. Run in-process (cli-harness).

import { existsSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCommandLine, UsageError } from '../../../main/cli/args';
import { closestName, editDistance } from '../../../main/cli/closest-name';
import { COMMANDS } from '../../../main/cli/run';
import { usageLine } from '../../../main/cli/usage';
import { runCli } from './cli-harness';

const SAMPLE = ['--depots', 'sample-data/depots.csv', '--lanes', 'sample-data/lanes.csv'];

function refusal(argv: string[]): string {
  const routes = COMMANDS.find((c) => c.name === 'routes')!;
  try {
    parseCommandLine('routes', argv, routes.options, new Map([['loop-cap', ['audit', 'compare']]]));
  } catch (error) {
    expect(error).toBeInstanceOf(UsageError);
    return (error as Error).message;
  }
  throw new Error(`accepted: ${argv.join(' ')}`);
}

describe('editDistance and closestName', () => {
  it('counts one edit per missing, extra, wrong or swapped character', () => {
    // Levenshtein's textbook pair: kitten -> sitting is 3 (common practice, no source).
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('vehicle-clas', 'vehicle-class')).toBe(1);
    expect(editDistance('jsno', 'json')).toBe(1);
    expect(editDistance('', 'abc')).toBe(3);
  });
  it('suggests only a near name, or the one name a prefix starts', () => {
    expect(closestName('max-leg', ['max-legs', 'json'])).toBe('max-legs');
    expect(closestName('to', ['out', 'from'])).toBeNull();
    expect(closestName('veh', ['vehicle-class', 'vehicles'])).toBeNull();
    expect(closestName('vehicle-cla', ['vehicle-class', 'vehicles'])).toBe('vehicle-class');
    expect(closestName('date-form', ['from-date', 'to-date', 'date'])).toBeNull();
  });
});

describe('parseCommandLine (strict, table-driven)', () => {
  it('refuses a misspelt option naming it and the nearest valid name', () => {
    expect(refusal([...SAMPLE, '--from', 'RTM', '--vehicle-clas', '2axle'])).toMatch(/^unknown option --vehicle-clas; did you mean --vehicle-class\?/);
    expect(refusal([...SAMPLE, '--from', 'RTM', '--max-leg', '1'])).toMatch(/^unknown option --max-leg; did you mean --max-legs\?/);
    expect(refusal([...SAMPLE, '--from', 'RTM', '--zzz'])).toMatch(/^unknown option --zzz \(/);
    expect(refusal([...SAMPLE, '--from', 'RTM', '--loop-cap', '3'])).toContain('unknown option --loop-cap for routes; it belongs to audit, compare');
    expect(refusal([...SAMPLE, '--from', 'RTM', '-x'])).toMatch(/^unknown option -x/);
  });
  it('gives a flag with a value and an option without one their own messages', () => {
    expect(refusal([...SAMPLE, '--from', 'RTM', '--json=yes'])).toMatch(/^--json is a flag and takes no value/);
    expect(refusal([...SAMPLE, '--from', 'RTM', '--json', 'yes'])).toMatch(/^--json is a flag and takes no value, got "yes"/);
    expect(refusal([...SAMPLE, '--from'])).toMatch(/^--from needs a value: --from DEPOT_ID$/);
    expect(refusal([...SAMPLE, '--from', '--json'])).toMatch(/^--from needs a value: --from DEPOT_ID, got the option --json/);
    expect(refusal([...SAMPLE, '--from='])).toMatch(/^--from needs a value/);
  });
  it('refuses stray words, a repeated option and a missing required one', () => {
    expect(refusal([...SAMPLE, '--from', 'RTM', 'extra'])).toMatch(/^unexpected argument "extra"/);
    expect(refusal([...SAMPLE, '--from', 'RTM', '--from', 'ANR'])).toMatch(/^--from is given more than once/);
    expect(refusal(SAMPLE)).toMatch(/^missing required option --from DEPOT_ID/);
  });
  it('reads values, flags, `--name=value` and negative numbers', () => {
    const routes = COMMANDS.find((c) => c.name === 'routes')!;
    const args = parseCommandLine('routes', [...SAMPLE, '--from=RTM', '--json', '--default-toll', '-1.50'], routes.options);
    expect(args.values.get('from')).toBe('RTM');
    expect(args.values.get('default-toll')).toBe('-1.50');
    expect([...args.flags]).toEqual(['json']);
  });
  it('treats prototype names as unknown options, not as table entries', () => {
    for (const name of ['constructor', '__proto__', 'toString', 'hasOwnProperty']) expect(refusal([...SAMPLE, '--from', 'RTM', `--${name}`])).toContain(`unknown option --${name}`);
  });
});

describe('usage and help come from the same tables', () => {
  it('every option of every command appears in its usage line and its --help', async () => {
    for (const command of COMMANDS) {
      const help = await runCli([command.name, '--help']);
      expect(help.status).toBe(0);
      expect(help.stdout).toContain(`lanewright ${command.name}: ${command.summary}`);
      expect(help.stdout).toContain('example:');
      expect(help.stdout).toContain(command.example);
      for (const o of command.options) {
        expect(help.stdout).toContain(`--${o.name}`);
        expect(usageLine(command)).toContain(o.group === undefined || o.required ? `--${o.name}` : `[${o.group}]`);
      }
    }
  });
  it('the example of every command parses against its own table', () => {
    for (const command of COMMANDS) {
      const words = command.example.split(' ');
      expect(words.slice(0, 2)).toEqual(['lanewright', command.name]);
      expect(() => parseCommandLine(command.name, words.slice(2), command.options)).not.toThrow();
    }
  });
  it('the example of every command reads only files shipped in sample-data/ and names its date', () => {
    for (const command of COMMANDS) {
      const words = command.example.split(' ');
      const inputs = words.filter((_, i) => ['--depots', '--lanes', '--loads', '--vehicles', '--scenario'].includes(words[i - 1]));
      for (const file of inputs) expect(existsSync(file), `${command.name}: ${file}`).toBe(true);
      expect(command.example, command.name).toMatch(/--date \d{4}-\d{2}-\d{2}/);
    }
  });
  it('`lanewright help CMD`, `-h` and the overview', async () => {
    expect((await runCli(['help', 'audit'])).stdout).toContain('--loop-cap N');
    expect((await runCli(['dispatch', '-h'])).stdout).toContain('--alternatives K');
    const overview = await runCli(['--help']);
    expect(overview.status).toBe(0);
    for (const c of COMMANDS) expect(overview.stdout).toContain(c.name);
    expect((await runCli([])).status).toBe(2);
  });
  it('--version prints the package version', async () => {
    const { version } = JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string };
    const result = await runCli(['--version']);
    expect(result).toMatchObject({ status: 0, stdout: `lanewright ${version}\n` });
  });
});

describe('the command line refuses mistakes with exit status 2 and one line', () => {
  it.each([
    [['routes', ...SAMPLE, '--from', 'RTM', '--vehicle-clas', '2axle'], 'unknown option --vehicle-clas; did you mean --vehicle-class?'],
    [['audit', ...SAMPLE, '--max-leg', '1'], 'unknown option --max-leg'],
    [['check', ...SAMPLE, '--json=1'], '--json is a flag and takes no value'],
    [['compare', ...SAMPLE, '--from', 'RTM', '--scenario'], '--scenario needs a value'],
    [['export', ...SAMPLE, '--lanes-out'], '--lanes-out needs a value'],
    [['dispatch', ...SAMPLE, '--loads', 'x.csv', '--alternative', '2'], 'did you mean --alternatives?'],
    [['rotues', ...SAMPLE], 'unknown command "rotues"; did you mean routes?'],
    [['--from', 'RTM', 'routes'], 'the command comes first'],
  ])('%j', async (argv, message) => {
    const result = await runCli(argv);
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    const lines = result.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toContain(message);
  });
});
