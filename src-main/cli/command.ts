/**
 * The shape of one command-line command. To add a command: write src-main/cli/commands/<name>.ts that
 * exports a `Command`, and add it to the list in src-main/cli/commands/index.ts (one line).
 */
import type { CliIo, ExitCode } from './io.ts';
import type { OptionRange } from './number-option.ts';

/**
 * A flag taking a number: the text is read with engineering entry in `unit` ("--load 500m", "--vin 12V")
 * and checked against `range` by the one reader of numeric options (number-option.ts).
 */
export interface NumberFlag {
  name: string;
  kind: 'number';
  unit: string;
  /** Placeholder in the usage text, e.g. "A". */
  placeholder: string;
  help: string;
  /** The allowed values (every numeric option has one; OPTION_RANGES in number-option.ts). */
  range: OptionRange;
}

export interface SwitchFlag {
  name: string;
  kind: 'switch';
  help: string;
}

/** A flag taking a word or a list, kept as text ("--role switch", "--parts a,b"). */
export interface TextFlag {
  name: string;
  kind: 'text';
  placeholder: string;
  help: string;
  /** Returns a sentence when the text is not allowed. */
  check?: (value: string) => string | null;
  /** Optional one-letter short form: "o" lets "-o FILE" stand for "--output FILE". */
  short?: string;
}

export type FlagSpec = NumberFlag | SwitchFlag | TextFlag;

export interface ParsedArgs {
  positionals: string[];
  numbers: Record<string, number>;
  switches: Set<string>;
  texts: Record<string, string>;
}

export interface Command {
  name: string;
  /** One line for the command list. */
  summary: string;
  /** Names of the positional arguments, e.g. ["DESIGN.json"]; all are required. */
  positionals: readonly string[];
  flags: readonly FlagSpec[];
  /** Extra lines for the command's help (what the output holds, units). */
  details?: readonly string[];
  run(args: ParsedArgs, io: CliIo): Promise<ExitCode>;
}
