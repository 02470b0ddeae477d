/**
 * The command-line entry: picks the command from the registry (commands/index.ts), reads its
 * arguments, runs it, and returns the exit code. Usage mistakes print the usage text to stderr (exit 2);
 * an unexpected exception prints one sentence, never a stack trace (exit 3).
 */
import { parseArgs } from './args.ts';
import { COMMANDS } from './commands/index.ts';
import type { CliIo, ExitCode } from './io.ts';
import { EXIT, processIo } from './io.ts';
import { commandUsage, programUsage, PROGRAM } from './usage.ts';

const wantsHelp = (argv: readonly string[]): boolean => argv.includes('--help') || argv.includes('-h');

export async function runCli(argv: readonly string[], io: CliIo): Promise<ExitCode> {
  const [name, ...rest] = argv;
  if (name === undefined || name === 'help' || name === '--help' || name === '-h') {
    const topic = name === 'help' ? COMMANDS.find((c) => c.name === rest[0]) : undefined;
    if (name === undefined) {
      io.err(`${PROGRAM}: a command is needed.\n\n${programUsage(COMMANDS)}`);
      return EXIT.usage;
    }
    io.out(topic ? commandUsage(topic) : programUsage(COMMANDS));
    return EXIT.ok;
  }
  const command = COMMANDS.find((c) => c.name === name);
  if (!command) {
    io.err(`${PROGRAM}: unknown command "${name}".\n\n${programUsage(COMMANDS)}`);
    return EXIT.usage;
  }
  if (wantsHelp(rest)) {
    io.out(commandUsage(command));
    return EXIT.ok;
  }
  const parsed = parseArgs(command, rest);
  if (!parsed.ok) {
    io.err(`${PROGRAM} ${command.name}: ${parsed.message}\n\n${commandUsage(command)}`);
    return EXIT.usage;
  }
  try {
    return await command.run(parsed.args, io);
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    io.err(`${PROGRAM} ${command.name}: internal error, please report it: ${reason}`);
    return EXIT.internal;
  }
}

/** Runs with the process's arguments and streams, and sets the exit code. */
export async function runFromProcess(): Promise<void> {
  process.exitCode = await runCli(process.argv.slice(2), processIo());
}
