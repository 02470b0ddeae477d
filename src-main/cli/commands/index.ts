/**
 * The command registry: one line per command. To add one, write commands/<name>.ts exporting a
 * `Command` (see ../command.ts) and list it here; main.ts, the usage text and --help pick it up.
 */
import type { Command } from '../command.ts';
import { evaluateCommand } from './evaluate.ts';
import { pointCommand } from './point.ts';
import { sweepCommand } from './sweep.ts';
import { compareCommand } from './compare.ts';
import { toleranceCommand } from './tolerance.ts';
import { reportCommand } from './report.ts';
import { fitCommand } from './fit.ts';
import { sizeCommand } from './size.ts';
import { rankCommand } from './rank.ts';

export const COMMANDS: readonly Command[] = [pointCommand, evaluateCommand, sweepCommand, compareCommand, rankCommand, toleranceCommand, fitCommand, sizeCommand, reportCommand];
