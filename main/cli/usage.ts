// Usage and help text, generated from the commands' option tables (options.ts), so the help always
// lists exactly the options the parser accepts.

import { CAUTIONS } from '../../engine/index';
import type { CommandSpec, OptionSpec } from './options';

function optionWords(o: OptionSpec): string {
  return o.value === undefined ? `--${o.name}` : `--${o.name} ${o.value}`;
}

/** `lanewright routes --depots FILE --lanes FILE --from DEPOT_ID [--max-legs K] ... [planning options]` */
export function usageLine(command: CommandSpec): string {
  const own = command.options.filter((o) => o.group === undefined || o.required);
  const required = own.filter((o) => o.required).map(optionWords);
  const optional = own.filter((o) => !o.required).map((o) => `[${optionWords(o)}]`);
  const groups = [...new Set(command.options.filter((o) => o.group !== undefined && !o.required).map((o) => o.group!))].map((g) => `[${g}]`);
  return ['lanewright', command.name, ...required, ...optional, ...groups].join(' ');
}

function optionLines(options: readonly OptionSpec[]): string[] {
  const width = Math.max(...options.map((o) => optionWords(o).length));
  return options.map((o) => `  ${optionWords(o).padEnd(width)}  ${o.help}${o.required ? ' (required)' : ''}`);
}

/** `lanewright COMMAND --help`: what it does, its usage line, every option by group, an example. */
export function commandHelp(command: CommandSpec): string {
  const own = command.options.filter((o) => o.group === undefined);
  const groups = new Map<string, OptionSpec[]>();
  for (const o of command.options) if (o.group !== undefined) groups.set(o.group, [...(groups.get(o.group) ?? []), o]);
  const lines = [`lanewright ${command.name}: ${command.summary}`, '', command.details, '', `usage: ${usageLine(command)}`, '', 'options:', ...optionLines(own)];
  for (const [group, options] of groups) lines.push('', `${group}:`, ...optionLines(options));
  lines.push('', 'example:', `  ${command.example}`, '', ...CAUTIONS);
  return lines.join('\n') + '\n';
}

/** `lanewright` and `lanewright --help`: the commands with one line each. */
export function overview(commands: readonly CommandSpec[]): string {
  const width = Math.max(...commands.map((c) => c.name.length));
  return [
    'usage: lanewright COMMAND [options]',
    '       lanewright COMMAND --help   (what the command does, its options, an example)',
    '       lanewright --version',
    '',
    'commands:',
    ...commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    ...CAUTIONS,
  ].join('\n') + '\n';
}
