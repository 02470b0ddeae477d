/**
 * Usage texts: the command list, and one command's arguments and options.
 */
import type { Command } from './command.ts';
import { optionRangeText } from './number-option.ts';
import { renderTable } from './table.ts';

export const PROGRAM = 'wattledger';

export const EXIT_CODES_TEXT =
  'Exit codes: 0 success; 1 invalid or unreadable design (every problem on stderr); 2 wrong usage; 3 internal error.';

export function programUsage(commands: readonly Command[]): string {
  const rows = commands.map((c) => [`${c.name} ${c.positionals.join(' ')}`, c.summary]);
  return [
    `Usage: ${PROGRAM} <command> [options]`,
    '',
    'Commands:',
    renderTable([{ title: '' }, { title: '' }], rows).split('\n').slice(1).map((l) => `  ${l}`).join('\n'),
    '',
    `Run "${PROGRAM} <command> --help" for the options of one command.`,
    EXIT_CODES_TEXT,
  ].join('\n');
}

export function commandUsage(command: Command): string {
  const flagRows = command.flags.map((f) => [
    f.kind === 'switch' ? `--${f.name}` : `${f.kind === 'text' && f.short ? `-${f.short}, ` : ''}--${f.name} ${f.placeholder}`,
    f.kind === 'number' ? `${f.help} Allowed: ${optionRangeText(f.name, f.unit, f.range)}.` : f.help,
  ]);
  flagRows.push(['--help', 'Show this text.']);
  const lines = [
    `Usage: ${PROGRAM} ${command.name} ${command.positionals.join(' ')} [options]`,
    '',
    command.summary,
    '',
    'Options:',
    renderTable([{ title: '' }, { title: '' }], flagRows).split('\n').slice(1).map((l) => `  ${l}`).join('\n'),
  ];
  if (command.details?.length) lines.push('', ...command.details);
  lines.push('', EXIT_CODES_TEXT);
  return lines.join('\n');
}
