/**
 * The printed report, read back from the PDF: the report of each demo design is built, written as the
 * self-contained HTML, printed by Debian's Chromium (the same path as `wattledger report --pdf`), turned
 * into text with poppler's pdftotext and into 60 dpi page images (.artifacts/report/) with pdftoppm.
 * Every expected number is computed here by an independent call of the engine and written with the
 * report's own formatter, so the test checks that the page shows the engine's value to its printed
 * precision — nothing is typed in.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { balanceDecimals, buildReport, evaluate, evaluateMission, formatEngineering, reviewDesign, sizingRows, figuresOfMerit, formatFigurePercent, findLandmarks, formatAmps, formatCelsius, formatDuty, formatKelvin, formatPercent, formatWatts, formatWattsFixed, roleLabel, serializeDesign, sweepLoad, validateDesign } from '../../shared-model/index.ts';
import { METHOD_CATALOGUE } from '../../shared-model/report/methods.ts';
import { REPORT_CAUTIONS } from '../../shared-model/report/cautions.ts';
import type { Design, ReportModel } from '../../shared-model/index.ts';
import { ensureReportBundle, readBuiltPage, REPO_ROOT } from '../../src-main/report/bundle.ts';
import { findChromium, reportPdf } from '../../src-main/report/pdf.ts';
import { singleFileReport, type PageSize } from '../../src-main/report/single-file.ts';
import { demoDesign } from '../helpers/demo.ts';

const OUT = join(REPO_ROOT, '.artifacts', 'report');
const DATE = '2026-12-02';
const SLOW = 1_200_000;

interface Printed {
  id: string;
  size: PageSize;
  design: Design;
  model: ReportModel;
  pdf: string;
  pages: string[];
  /** All pages, whitespace runs collapsed to one space. */
  flat: string;
}

const flatten = (text: string): string => text.replace(/\s+/g, ' ');

/** A design with a hazard made here: the heatsink of the synchronous demo four times worse. */
function hotSinkDesign(): Design {
  const design = structuredClone(demoDesign('synchronous-buck'));
  design.name = `${design.name} with a poor heatsink`;
  for (const sink of design.thermal.heatsinks) sink.thetaSaKPerW *= 4;
  const checked = validateDesign(design);
  if (!checked.ok) throw new Error(checked.problems.map((p) => p.message).join(' '));
  return checked.design;
}

/** The boost demo with a mission profile of our own (invented use: mostly idle on a battery). */
function profiledDesign(): Design {
  const design = structuredClone(demoDesign('diode-boost'));
  const s = design.spec;
  design.name = `${design.name} with a mission profile`;
  design.missionProfile = {
    name: 'Handheld, mostly idle (invented)', hoursPerDay: 8, batteryWh: 10,
    rows: [
      { label: 'idle', vinV: s.vinNomV, loadA: 0.05 * s.ratedLoadA, fraction: 0.7 },
      { label: 'active', vinV: s.vinNomV, loadA: 0.5 * s.ratedLoadA, fraction: 0.25 },
      { label: 'burst', vinV: s.vinMinV, loadA: s.ratedLoadA, fraction: 0.05 },
    ],
  };
  const checked = validateDesign(design);
  if (!checked.ok) throw new Error(checked.problems.map((p) => p.message).join(' '));
  return checked.design;
}

async function print(id: string, design: Design, size: PageSize, chromium: string): Promise<Printed> {
  const text = serializeDesign(design);
  if (!text.ok) throw new Error('design cannot be serialized');
  const model = buildReport({ design, documentText: text.text, date: DATE, appVersion: 'e2e', project: 'Report proof' });
  const html = singleFileReport(readBuiltPage(), model, size);
  const stem = join(OUT, `${id}-${size}`);
  writeFileSync(`${stem}.html`, html);
  writeFileSync(`${stem}.pdf`, await reportPdf(html, { chromiumPath: chromium }));
  for (const old of readdirSync(OUT).filter((f) => f.startsWith(`${id}-${size}-`) && f.endsWith('.png'))) rmSync(join(OUT, old));
  execFileSync('pdftoppm', ['-r', '60', '-png', `${stem}.pdf`, stem]);
  const pages = execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', `${stem}.pdf`, '-'], { encoding: 'utf8' }).split('\f').filter((p) => p.trim() !== '');
  return { id, size, design, model, pdf: `${stem}.pdf`, pages, flat: flatten(pages.join('\n')) };
}

/**
 * Fails with the first missing string, searching each after the previous one. Whitespace is ignored on
 * both sides: pdftotext sometimes drops the space between a number and its unit ("0W") or splits a
 * cell over two lines.
 */
function expectInOrder(text: string, expected: readonly string[], what: string): void {
  const compact = (x: string): string => x.replace(/\s+/g, '');
  const haystack = compact(text);
  let at = 0;
  for (const s of expected) {
    const needle = compact(s);
    const i = haystack.indexOf(needle, at);
    expect(i, `${what}: "${s}" not found after …${haystack.slice(Math.max(0, at - 40), at + 160)}…`).toBeGreaterThanOrEqual(0);
    at = i + needle.length;
  }
}

/** The text of one numbered section, from its heading to the next heading given. */
function section(p: Printed, from: string, to?: string): string {
  const start = p.flat.indexOf(from);
  expect(start, `heading "${from}"`).toBeGreaterThanOrEqual(0);
  const end = to === undefined ? p.flat.length : p.flat.indexOf(to, start);
  return p.flat.slice(start, end < 0 ? undefined : end);
}

const printed = new Map<string, Printed>();
const chromium = findChromium();

beforeAll(async () => {
  if (!chromium) throw new Error('Debian chromium is needed: apt-get install chromium poppler-utils');
  mkdirSync(OUT, { recursive: true });
  await ensureReportBundle();
  const cases: [string, Design, PageSize][] = [
    ['synchronous-buck', demoDesign('synchronous-buck'), 'A4'],
    ['diode-boost', demoDesign('diode-boost'), 'A4'],
    ['diode-boost', demoDesign('diode-boost'), 'Letter'],
    ['hot-fin-buck', demoDesign('hot-fin-buck'), 'A4'],
    ['hot-sink-buck', hotSinkDesign(), 'A4'],
    ['profiled-boost', profiledDesign(), 'A4'],
  ];
  for (const [id, design, size] of cases) printed.set(`${id}-${size}`, await print(id, design, size, chromium));
}, SLOW);

const get = (key: string): Printed => {
  const p = printed.get(key);
  if (!p) throw new Error(`not printed: ${key}`);
  return p;
};

describe.each(['synchronous-buck-A4', 'diode-boost-A4', 'diode-boost-Letter', 'hot-fin-buck-A4'])('the printed report %s', (key) => {
  it('is on the chosen paper with the design name, revision and page number on every page', () => {
    const p = get(key);
    const info = execFileSync('pdfinfo', [p.pdf], { encoding: 'utf8' });
    const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
    expect(pages).toBe(p.pages.length);
    expect(info).toMatch(p.size === 'A4' ? /Page size:\s+59[45](\.\d+)? x 84[12](\.\d+)? pts/ : /Page size:\s+612 x 792 pts/); // ISO 216 A4 210 × 297 mm; ANSI Letter 8.5 × 11 in
    p.pages.forEach((page, i) => {
      const flat = flatten(page);
      expect(flat, `page ${i + 1}`).toContain(`${p.design.name} · revision ${p.design.revision}`);
      expect(flat, `page ${i + 1}`).toContain(`Page ${i + 1} of ${pages}`);
    });
  });

  it('has every section, in the order of the review', () => {
    const p = get(key);
    expectInOrder(
      p.flat,
      [
        'Project', 'Report proof', 'Design', 'Revision', 'Author', p.design.author, 'Date', DATE, 'WattLedger version', 'e2e',
        'Design hash (SHA-256)', p.model.title.designHash,
        '1 Summary', 'Specification', 'Headline figures', 'Warnings and hazards',
        '2 Topology and operating point', 'Parts', 'Operating point at rated load',
        '3 Loss ledger at rated load', 'Power balance', 'Loss by part',
        '4 Efficiency, loss and temperature versus load', 'Landmarks of the sweep', 'Figures of merit',
        '5 Thermal table', 'Burn-hazard checks', 'Capacitor life', 'Saturation margin', 'Other rating checks',
        '6 Sizing', '7 Design checks', '8 Mission profile',
        '9 Method and assumptions', '10 Cautions and sign-off', 'Sign-off', 'Reviewer', 'Approver',
      ],
      'sections',
    );
    for (const m of p.model.methods) expect(section(p, '9 Method and assumptions', '10 Cautions')).toContain(m.title);
    expect(METHOD_CATALOGUE.some((m) => m.id === 'overlap' && p.flat.includes(m.title))).toBe(true);
    for (const c of REPORT_CAUTIONS) expect(section(p, '10 Cautions')).toContain(c.slice(0, 40));
  });

  it('prints the engine\'s efficiencies, landmarks and figures of merit in the summary', () => {
    const p = get(key);
    const s = p.design.spec;
    const rated = evaluate(p.design);
    const sweep = sweepLoad(p.design, { conditions: { vinV: s.vinNomV } });
    const marks = findLandmarks(sweep, { design: p.design });
    const fom = figuresOfMerit(p.design, { conditions: { vinV: s.vinNomV } });
    const hottest = [...rated.temperatures].sort((a, b) => b.celsius - a.celsius)[0]!;
    const summary = section(p, '1 Summary', '2 Topology');
    expectInOrder(
      summary,
      [
        'Efficiency at rated load, Vin nom', formatPercent(rated.efficiency), formatWatts(rated.inputPower), formatWatts(rated.outputPower), formatWatts(rated.totalLoss),
        'Peak efficiency', `${formatPercent(marks.peak.value!)} at ${formatAmps(marks.peak.load!)}`,
        'Light-load knee', ...(marks.knee.load === null ? [] : [`${formatPercent(marks.knee.value!)} at ${formatAmps(marks.knee.load)}`]), marks.knee.definition.slice(0, 40),
        'Average efficiency', formatFigurePercent(fom.averageEfficiency),
        'Efficiency at 10 % load', formatFigurePercent(fom.lightLoadEfficiency),
        'Hottest part', roleLabel(hottest.part), formatCelsius(hottest.celsius), formatCelsius(hottest.limit), formatKelvin(hottest.marginK),
        'Thermal ceiling',
      ],
      'summary',
    );
    for (const a of p.model.summary.alerts) expect(summary, a.code).toContain(a.message.slice(0, 30));
  });

  it('prints the operating point at Vin min, nom and max as the engine solves it', () => {
    const p = get(key);
    const s = p.design.spec;
    const cases = [s.vinMinV, s.vinNomV, s.vinMaxV].map((vinV) => evaluate(p.design, { vinV }));
    const op = section(p, '2 Topology and operating point', '3 Loss ledger');
    expectInOrder(op, ['Duty cycle', ...cases.map((e) => formatDuty(e.dutyCycle))], 'duty cycle');
    expectInOrder(op, ['Inductor current, RMS', ...cases.map((e) => formatAmps(e.operatingPoint.inductor.rmsA))], 'inductor RMS');
    expectInOrder(op, ['Efficiency', ...cases.map((e) => formatPercent(e.efficiency))], 'efficiency');
    expectInOrder(op, ['Total loss', ...cases.map((e) => formatWatts(e.totalLoss))], 'total loss');
  });

  it('prints every loss term of the engine\'s ledger, and a power balance that balances', () => {
    const p = get(key);
    const e = evaluate(p.design);
    const ledger = section(p, '3 Loss ledger at rated load', 'Loss by part');
    expectInOrder(ledger, e.losses.flatMap((t) => [t.mechanism, formatWatts(t.watts), formatPercent(t.watts / e.totalLoss, 1)]), 'ledger rows');
    expectInOrder(ledger, ['Total', formatWatts(e.totalLoss)], 'ledger total');
    const d = balanceDecimals(e.totalLoss);
    const line = /Power balance: input (\S+) W = output (\S+) W \+ losses (\S+) W/.exec(ledger);
    expect(line, 'power balance line').not.toBeNull();
    const [input, output, losses] = line!.slice(1).map(Number) as [number, number, number];
    expect(`${line![1]} W`).toBe(formatWattsFixed(e.inputPower, d));
    expect(`${line![2]} W`).toBe(formatWattsFixed(e.outputPower, d));
    expect(`${line![3]} W`).toBe(formatWattsFixed(e.totalLoss, d));
    expect(Math.abs(input - (output + losses))).toBeLessThanOrEqual(1.5 * 10 ** -d); // each printed figure is within half a unit of the last decimal (rounding), so the sum may differ by at most 1.5 units
  });

  it('prints every part\'s temperature, limit, margin and surface, the hazard checks and the saturation margin', () => {
    const p = get(key);
    const e = evaluate(p.design);
    const thermal = section(p, '5 Thermal table', '6 Sizing');
    expectInOrder(thermal, e.temperatures.flatMap((t) => [formatWatts(t.dissipationW), formatCelsius(t.celsius), formatCelsius(t.limit), formatKelvin(t.marginK), formatCelsius(t.surfaceC)]), 'thermal rows');
    expectInOrder(thermal, ['Heatsinks', ...e.heatsinks.flatMap((h) => [formatWatts(h.dissipationW), formatCelsius(h.celsius)])], 'heatsinks');
    expectInOrder(
      thermal,
      ['Burn-hazard checks', ...e.hazards.flatMap((h) => [formatCelsius(h.surfaceC), formatCelsius(h.row.limitC), h.row.standard, formatKelvin(h.marginK), h.exceeded ? 'HAZARD' : 'within'])],
      'hazard rows',
    );
    const sat = e.checks.find((c) => c.check === 'saturation')!;
    expectInOrder(thermal, ['Saturation margin', formatAmps(sat.value), formatAmps(sat.limit), formatPercent(sat.marginFraction, 1)], 'saturation');
  });

  it('prints the figures of merit the engine computes at exactly 10/25/50/75/100 % load', () => {
    const p = get(key);
    const fom = figuresOfMerit(p.design, { conditions: { vinV: p.design.spec.vinNomV } });
    const curves = section(p, '4 Efficiency, loss and temperature versus load', '5 Thermal table');
    expectInOrder(curves, ['Figures of merit', ...fom.points.flatMap((x) => [formatAmps(x.loadA), formatPercent(x.efficiency)]), formatFigurePercent(fom.averageEfficiency)], 'figures of merit');
  });
});

describe.each(['synchronous-buck-A4', 'diode-boost-A4', 'profiled-boost-A4'])('the sizing, design checks and mission profile of %s', (key) => {
  it('prints every sized value and every design check the engine finds, with its source and the cautions', () => {
    const p = get(key);
    const r = reviewDesign(p.design); // an independent call of the engine
    const fmt = (x: number, unit: string) => formatEngineering(x, unit, 3, 'table');
    const sizing = section(p, '6 Sizing', '7 Design checks');
    const rows = sizingRows(r.sizing).filter((x) => x.value);
    expect(rows.length).toBeGreaterThan(5);
    // A label may wrap inside its cell (pdftotext then prints its second line after the row's other cells): values in order, labels by their first word.
    expectInOrder(sizing, rows.map((x) => formatEngineering(x.value!.value, x.value!.unit, 4, 'table')), 'sizing values');
    for (const x of rows) expect(sizing).toContain(x.label.split(' ')[0]!);
    expect(sizing).toMatch(/defer to local codes, the applicable standards and licensed professional practice/); // team rules: cautions
    const checks = section(p, '7 Design checks', '8 Mission profile');
    expect(checks).toContain(`${r.counts.fail} fail, ${r.counts.warn} to watch, ${r.counts.pass} ok`);
    const ORDER = { fail: 0, warn: 1, pass: 2 } as const;
    const WORD = { fail: 'FAIL', warn: 'WATCH', pass: 'ok' } as const;
    const sorted = [...r.checks].sort((a, b) => ORDER[a.status] - ORDER[b.status]);
    expectInOrder(checks, sorted.flatMap((c) => [fmt(c.value, c.unit), fmt(c.limit, c.unit), WORD[c.status], formatPercent(c.marginFraction, 1)]), 'check rows');
    for (const c of sorted) expect(checks).toContain(c.label.split(' ')[0]!);
    for (const c of sorted.filter((k) => k.status !== 'pass')) expect(checks).toContain(c.message.slice(0, 30)); // the sentence of each open check
    expect(checks).toMatch(/defer to local codes and licensed professional practice/); // team rules: cautions
  });

  it('prints the mission profile figures, or says the design has none', () => {
    const p = get(key);
    const mission = section(p, '8 Mission profile', '9 Method');
    if (!p.design.missionProfile) {
      expect(mission).toContain('The design carries no mission profile');
      return;
    }
    const m = evaluateMission(p.design); // an independent call of the engine
    expectInOrder(mission, m.rows.flatMap((r) => [r.label, formatPercent(r.fraction, 1), formatWatts(r.lossW)]), 'mission rows');
    expectInOrder(mission, ['Weighted efficiency', formatPercent(m.weightedEfficiency), 'Average loss', formatWatts(m.averageLossW), 'Energy lost per day', formatEngineering(m.energyLostPerDayWh, 'Wh', 3, 'table')], 'mission figures');
    expectInOrder(mission, ['Share of the battery lost per day', formatPercent(m.battery!.shareLostPerDay)], 'battery share');
    expectInOrder(mission, m.temperatures.flatMap((t) => [roleLabel(t.part), formatCelsius(t.averageC), formatCelsius(t.worstC)]), 'mission temperatures');
    expect(mission).toMatch(/defer to local codes and licensed professional practice/); // team rules: cautions
  });
});

describe.each(['hot-fin-buck-A4', 'hot-sink-buck-A4'])('a design with a touch hazard (%s)', (key) => {
  it('shows the hazard in the summary and in the thermal table', () => {
    const p = get(key);
    const e = evaluate(p.design);
    const hazards = e.hazards.filter((h) => h.exceeded);
    expect(hazards.length).toBeGreaterThan(0);
    const summary = section(p, '1 Summary', '2 Topology');
    expect(summary).toMatch(/DANGER Burn hazard/);
    const thermal = section(p, 'Burn-hazard checks', 'Capacitor life');
    for (const h of hazards) {
      expectInOrder(thermal, [roleLabel(h.part).split(' ')[0]!, formatCelsius(h.surfaceC), formatCelsius(h.row.limitC), h.row.standard, formatKelvin(h.marginK), 'HAZARD', 'too hot to touch'], `hazard ${h.part}`);
    }
  });
});
