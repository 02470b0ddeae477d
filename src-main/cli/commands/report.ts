/**
 * `wattledger report DESIGN.json -o FILE [--pdf] [--page A4|Letter] [--csv] [--project TEXT] [--date DATE]
 * [--tolerance [--samples N --seed S]] [--compare-role ROLE --compare-parts ID,ID]`: the design-review
 * report as one self-contained HTML file, and as PDF where a Chromium is installed (Debian's chromium
 * through playwright-core). Optional CSV files of the load sweep and of the ledger, a tolerance appendix
 * and a comparison appendix. Everything shown is the engine's records, formatted (shared-model/report).
 */
import nodePath from 'node:path';
import {
  buildReport,
  compareParts,
  DEMO_PARTS_LIBRARY,
  DEFAULT_MONTE_CARLO_SAMPLES,
  DEFAULT_MONTE_CARLO_SEED,
  monteCarlo,
  partInRole,
  ROLES,
  serializeDesign,
  validatePartsLibrary,
  worstCase,
} from '../../../shared-model/index.ts';
import type { Comparison, Design, Part, Role } from '../../../shared-model/index.ts';
import { version as packageVersion } from '../../../package.json';
import { CAUTION_LINE } from '../cautions.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import type { CliIo, ExitCode } from '../io.ts';
import { EXIT } from '../io.ts';
import { OPTION_RANGES } from '../number-option.ts';

const PROGRAM = 'wattledger report';
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function today(now: Date = new Date()): string {
  const pad = (n: number): string => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

function appVersion(): string {
  return typeof packageVersion === 'string' ? packageVersion : 'unknown';
}

function comparisonFor(design: Design, role: Role, ids: string[], io: CliIo): Comparison | null {
  const checked = validatePartsLibrary(DEMO_PARTS_LIBRARY);
  const own = partInRole(design, role);
  const candidates = [...(own ? [own] : []), ...(checked.ok ? checked.library.parts : [])];
  const parts: Part[] = [];
  for (const id of ids) {
    const part = candidates.find((p) => p.id === id);
    if (!part) {
      io.err(`${PROGRAM}: --compare-parts: no part "${id}" in the parts library or the design's ${role}.`);
      return null;
    }
    parts.push(part);
  }
  const outcome = compareParts(design, { role, parts });
  if (!outcome.ok) {
    io.err(`${PROGRAM}: ${outcome.problems.map((p) => `${p.message} (path: ${p.path}; allowed: ${p.allowed})`).join(' ')}`);
    return null;
  }
  return outcome.comparison;
}

export const reportCommand: Command = {
  name: 'report',
  summary: 'The design-review report as self-contained HTML, and PDF where Chromium is installed.',
  positionals: ['DESIGN.json'],
  flags: [
    { name: 'output', short: 'o', kind: 'text', placeholder: 'FILE', help: 'The HTML file to write (required); a name ending in .pdf names the PDF instead.' },
    { name: 'pdf', kind: 'switch', help: 'Also write the PDF beside it (same name, .pdf), printed by Chromium.' },
    {
      name: 'page', kind: 'text', placeholder: 'A4|Letter', help: 'Paper size (default A4).',
      check: (v) => (v === 'A4' || v === 'Letter' ? null : `must be A4 or Letter; got "${v}".`),
    },
    { name: 'csv', kind: 'switch', help: 'Also write FILE-sweep.csv and FILE-ledger.csv.' },
    { name: 'project', kind: 'text', placeholder: 'TEXT', help: 'Project name for the title block (default: the design\'s own project field).' },
    {
      name: 'date', kind: 'text', placeholder: 'YYYY-MM-DD', help: 'Date printed on the report (default: today).',
      check: (v) => (ISO_DATE.test(v) ? null : `must be a date written YYYY-MM-DD; got "${v}".`),
    },
    { name: 'tolerance', kind: 'switch', help: 'Add the tolerance appendix (worst-case corners and a Monte Carlo).' },
    {
      name: 'samples', kind: 'number', unit: '', placeholder: 'N', help: `Monte Carlo samples with --tolerance (default ${DEFAULT_MONTE_CARLO_SAMPLES}).`,
      range: OPTION_RANGES.samples,
    },
    {
      name: 'seed', kind: 'number', unit: '', placeholder: 'S', help: `Monte Carlo seed with --tolerance (default ${DEFAULT_MONTE_CARLO_SEED}).`,
      range: OPTION_RANGES.seed,
    },
    {
      name: 'compare-role', kind: 'text', placeholder: 'ROLE', help: `Add the comparison appendix for this role: ${ROLES.join(', ')}.`,
      check: (v) => ((ROLES as readonly string[]).includes(v) ? null : `must be one of ${ROLES.join(', ')}; got "${v}".`),
    },
    { name: 'compare-parts', kind: 'text', placeholder: 'ID,ID[,ID…]', help: 'Two or more part ids (parts library or the design) for the comparison.' },
  ],
  details: [
    'The HTML file holds everything (no other files, no network); open it in any browser or print it.',
    'The PDF needs Chromium (WATTLEDGER_CHROMIUM, else /usr/bin/chromium); without one the HTML is still',
    'written and the command exits 3 saying so. The CSV files carry the engine\'s values in SI units.',
  ],
  async run(args, io): Promise<ExitCode> {
    const output = args.texts.output;
    if (!output) {
      io.err(`${PROGRAM}: give the file to write with -o FILE (for example -o review.html).`);
      return EXIT.usage;
    }
    const role = args.texts['compare-role'] as Role | undefined;
    const ids = (args.texts['compare-parts'] ?? '').split(',').map((s) => s.trim()).filter((s) => s !== '');
    if ((role === undefined) !== (ids.length === 0) || (role !== undefined && ids.length < 2)) {
      io.err(`${PROGRAM}: a comparison needs both --compare-role ROLE and --compare-parts with two or more part ids.`);
      return EXIT.usage;
    }
    const loaded = await loadDesign(args.positionals[0] ?? '', io, PROGRAM);
    if (!loaded.ok) return EXIT.invalidDesign;
    const design = loaded.design;
    // The report hashes the design's canonical text (shared-model/design/canonical.ts), not the file's bytes.
    const canonical = serializeDesign(design);
    const comparison = role ? comparisonFor(design, role, ids, io) : null;
    if (role && !comparison) return EXIT.usage;
    const tolerance = args.switches.has('tolerance');
    const model = buildReport({
      design,
      documentText: canonical.ok ? canonical.text : '',
      date: args.texts.date ?? today(),
      appVersion: appVersion(),
      project: args.texts.project ?? null,
      comparison,
      worstCase: tolerance ? worstCase(design) : null,
      monteCarlo: tolerance
        ? monteCarlo(design, { seed: args.numbers.seed ?? DEFAULT_MONTE_CARLO_SEED, samples: args.numbers.samples ?? DEFAULT_MONTE_CARLO_SAMPLES, histogramBins: 15 })
        : null,
    });

    const { reportPaths, writeReportFiles, saveFile } = await import('../../report/write-report.ts');
    const { ensureReportBundle, readBuiltPage } = await import('../../report/bundle.ts');
    const { findChromium, reportPdf } = await import('../../report/pdf.ts');
    const paths = reportPaths(nodePath.resolve(output), { pdf: args.switches.has('pdf'), csv: args.switches.has('csv') });
    const outcome = await writeReportFiles(model, paths, args.texts.page === 'Letter' ? 'Letter' : 'A4', {
      ensureBundle: () => ensureReportBundle(),
      readPage: () => readBuiltPage(),
      findChromium: () => findChromium(),
      printPdf: (html, chromiumPath) => reportPdf(html, { chromiumPath }),
      save: saveFile,
    });
    for (const file of outcome.written) io.out(`Wrote ${file}`);
    const alerts = model.summary.alerts.filter((a) => a.severity !== 'info').length;
    if (alerts > 0) io.out(`The report lists ${alerts} warning${alerts === 1 ? '' : 's'} or hazard${alerts === 1 ? '' : 's'}: read its summary.`);
    io.out(CAUTION_LINE);
    if (!outcome.ok) {
      io.err(`${PROGRAM}: ${outcome.message}`);
      return EXIT.internal;
    }
    return EXIT.ok;
  },
};
