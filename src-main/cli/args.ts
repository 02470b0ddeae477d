/**
 * Reads a command's arguments: positionals, "--flag value" / "--flag=value" numbers (engineering
 * entry and the option's range, number-option.ts: "--load 500m", "--ambient 40C"), texts, and switches
 * such as "--json". Every mistake comes back as one sentence for the usage error (exit code 2); nothing
 * throws.
 */
import type { Command, ParsedArgs } from './command.ts';
import { readNumberOption } from './number-option.ts';

export type ArgsResult = { ok: true; args: ParsedArgs } | { ok: false; message: string };

export function parseArgs(command: Command, argv: readonly string[]): ArgsResult {
  const args: ParsedArgs = { positionals: [], numbers: {}, switches: new Set(), texts: {} };
  for (let i = 0; i < argv.length; i += 1) {
    const raw = argv[i] ?? '';
    const short = /^-([A-Za-z])$/.exec(raw);
    const long = short ? command.flags.find((f) => f.kind === 'text' && f.short === short[1]) : undefined;
    const token = long ? `--${long.name}` : raw;
    if (!token.startsWith('--') || token === '--') {
      if (token.startsWith('-') && token.length > 1 && !/^-\d/.test(token))
        return { ok: false, message: `Unknown option "${token}" for "${command.name}".` };
      args.positionals.push(token);
      continue;
    }
    const eq = token.indexOf('=');
    const name = token.slice(2, eq < 0 ? undefined : eq);
    const flag = command.flags.find((f) => f.name === name);
    if (!flag) return { ok: false, message: `Unknown option "--${name}" for "${command.name}".` };
    if (flag.kind === 'switch') {
      if (eq >= 0) return { ok: false, message: `Option "--${name}" takes no value.` };
      args.switches.add(name);
      continue;
    }
    let text: string | undefined;
    if (eq >= 0) text = token.slice(eq + 1);
    else {
      text = argv[i + 1];
      i += 1;
    }
    if (text === undefined || text === '')
      return { ok: false, message: `Option "--${name}" needs a value (${flag.placeholder}).` };
    if (name in args.numbers || name in args.texts) return { ok: false, message: `Option "--${name}" is given twice.` };
    if (flag.kind === 'text') {
      const refusedText = flag.check?.(text);
      if (refusedText) return { ok: false, message: `Option "--${name}" ${refusedText}` };
      args.texts[name] = text;
      continue;
    }
    const read = readNumberOption(name, flag.unit, flag.range, text);
    if (!read.ok) return read;
    args.numbers[name] = read.value;
  }
  const want = command.positionals.length;
  if (args.positionals.length < want)
    return { ok: false, message: `"${command.name}" needs ${command.positionals.slice(args.positionals.length).join(' ')}.` };
  if (args.positionals.length > want)
    return { ok: false, message: `"${command.name}" takes ${want} argument${want === 1 ? '' : 's'}; unexpected "${args.positionals[want]}".` };
  return { ok: true, args };
}
