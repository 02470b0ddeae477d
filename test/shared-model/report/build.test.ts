/**
 * buildReport gathers the engine's records without changing them: each record is compared with an
 * independent call of the engine's public functions; the hash with Node's crypto (OpenSSL).
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { buildReport, compareParts, DEMO_PARTS_LIBRARY, evaluate, reviewDesign, figuresOfMerit, findLandmarks, monteCarlo, partsOfKind, sweepLoad, validatePartsLibrary, worstCase } from '../../../shared-model/index.ts';
import { titleBlock } from '../../../shared-model/report/build.ts';
import type { ReportModel } from '../../../shared-model/index.ts';
import { designText } from './demo.ts';
import { demoDesign } from '../../helpers/demo.ts';

const SLOW = 600_000;

function build(id: string, extra: Partial<Parameters<typeof buildReport>[0]> = {}): ReportModel {
  const design = demoDesign(id);
  return buildReport({ design, documentText: designText(design), date: '2026-12-02', appVersion: 'test-version', ...extra });
}

function finiteEverywhere(value: unknown, path = 'model'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => finiteEverywhere(v, `${path}[${i}]`));
  if (value && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => finiteEverywhere(v, `${path}.${k}`));
  return [];
}

describe.each(['synchronous-buck', 'diode-boost'])('buildReport on the %s demo', (id) => {
  const design = demoDesign(id);
  const model = build(id);
  const s = design.spec;

  it('carries the evaluations at rated load for Vin nom, min and max exactly as the engine gives them', () => {
    expect(model.rated).toEqual(evaluate(design, { vinV: s.vinNomV, loadA: s.ratedLoadA })); // independent engine run
    expect(model.inputVoltages.map((c) => c.vinV)).toEqual([s.vinMinV, s.vinNomV, s.vinMaxV]);
    expect(model.inputVoltages[0]!.evaluation).toEqual(evaluate(design, { vinV: s.vinMinV })); // independent engine run
    expect(model.inputVoltages[2]!.evaluation).toEqual(evaluate(design, { vinV: s.vinMaxV })); // independent engine run
  }, SLOW);

  it('carries the load sweep, its landmarks and the figures of merit unchanged', () => {
    const sweep = sweepLoad(design, { conditions: { vinV: s.vinNomV } });
    expect(model.sweep).toEqual(sweep); // independent engine run
    expect(model.landmarks).toEqual(findLandmarks(sweep, { design })); // independent engine run
    expect(model.figures).toEqual(figuresOfMerit(design, { conditions: { vinV: s.vinNomV } })); // independent engine run
    expect(model.vinFamily.map((f) => f.vinV)).toEqual([s.vinMinV, s.vinNomV, s.vinMaxV]);
    expect(model.vinFamily[1]!.efficiency).toEqual(sweep.points.map((p) => p.efficiency));
  }, SLOW);

  it('names the hottest part and the part with the least margin from the rated temperatures', () => {
    const temps = model.rated.temperatures;
    expect(model.summary.hottest?.celsius).toBe(Math.max(...temps.map((t) => t.celsius)));
    expect(model.summary.tightest?.marginK).toBe(Math.min(...temps.map((t) => t.marginK)));
  });

  it('puts every warning of the rated evaluations into the summary list', () => {
    for (const c of model.inputVoltages) {
      for (const w of c.evaluation.warnings) {
        expect(model.summary.alerts.some((a) => a.code === w.code && a.part === (w.part ?? null)), `${w.code} ${w.part}`).toBe(true);
      }
    }
  });

  it('is plain JSON with only finite numbers', () => {
    expect(finiteEverywhere(model)).toEqual([]);
    expect(JSON.parse(JSON.stringify(model))).toEqual(model);
  });

  it('lists the model of every loss mechanism in the ledger and sweep, with a source and its limits', () => {
    const ids = model.methods.map((m) => m.id);
    expect(ids).toContain('operating-point');
    expect(ids).toContain('thermal-network');
    expect(ids).toContain(design.topology.rectifier === 'diode' ? 'diode-forward' : 'dead-time');
    expect(ids).not.toContain(design.topology.rectifier === 'diode' ? 'dead-time' : 'diode-forward');
    for (const m of model.methods) expect(m.source.length, m.id).toBeGreaterThan(10);
    const overlap = model.methods.find((m) => m.id === 'overlap');
    expect(overlap?.limits.join(' ')).toMatch(/common-source inductance/i); // issue 6 §8 example of a known limit
  });
});

describe('buildReport method section: the load model used', () => {
  it.each([
    [undefined, 'load-constant-current'],
    ['resistive', 'load-resistive'],
    ['constant-power', 'load-constant-power'],
  ] as const)('spec.loadKind %s states %s and no other load model', (kind, id) => {
    const base = demoDesign('synchronous-buck');
    const design = { ...base, spec: { ...base.spec, ...(kind ? { loadKind: kind } : {}) } };
    const ids = buildReport({ design, documentText: designText(design), date: '2026-12-05', appVersion: 'test', sweepPoints: 8, familyPoints: 4 }).methods.map((m) => m.id);
    expect(ids.filter((x) => x.startsWith('load-'))).toEqual([id]); // issue 10 §3: the report's method section states the load model used
  });
});

describe('buildReport title block', () => {
  it('hashes the document text with SHA-256 and passes date, version and project through', () => {
    const design = demoDesign('hot-fin-buck');
    const text = designText(design);
    const title = buildReport({ design, documentText: text, date: '2031-01-15', appVersion: '9.9.9', project: '  Bench kit  ', sweepPoints: 20, familyPoints: 10 }).title;
    expect(title.designHash).toBe(createHash('sha256').update(text, 'utf8').digest('hex')); // Node crypto (OpenSSL) reference
    expect([title.date, title.appVersion, title.project, title.designName, title.revision]).toEqual(['2031-01-15', '9.9.9', 'Bench kit', design.name, design.revision]);
  }, SLOW);

  it('takes the project from the design when the caller gives none, the caller\'s when both do, and null when neither does', () => {
    const design = { ...demoDesign('hot-fin-buck'), project: ' Bench kit ' };
    const input = { documentText: '', date: '2031-01-15', appVersion: '9.9.9' };
    expect(titleBlock({ ...input, design }).project).toBe('Bench kit'); // the design's own field, trimmed
    expect(titleBlock({ ...input, design, project: 'Field unit' }).project).toBe('Field unit'); // the caller (the report command's --project) wins
    expect(titleBlock({ ...input, design: { ...design, project: '   ' } }).project).toBeNull(); // blank is "not stated"
    expect(titleBlock({ ...input, design: demoDesign('hot-fin-buck') }).project).toBeNull(); // absent (every v1 file before the field existed)
  });
});

describe('buildReport on a design with a touch hazard', () => {
  it('lists the burn hazard as a danger seen at rated load', () => {
    const model = build('hot-fin-buck', { sweepPoints: 40, familyPoints: 10 });
    const exceeded = model.rated.hazards.filter((h) => h.exceeded);
    expect(exceeded.length).toBeGreaterThan(0);
    for (const h of exceeded) {
      const alert = model.summary.alerts.find((a) => a.code === 'burn-hazard' && a.part === h.part);
      expect(alert?.severity).toBe('danger');
      expect(alert?.seenAt).toContain('rated load, Vin nom');
    }
    expect(model.summary.alerts[0]!.severity).toBe('danger'); // dangers first
  }, SLOW);
});

describe('buildReport appendices', () => {
  it('reduces a comparison and the tolerance results without changing their numbers', () => {
    const design = demoDesign('synchronous-buck');
    const library = validatePartsLibrary(DEMO_PARTS_LIBRARY);
    if (!library.ok) throw new Error('library invalid');
    const fets = partsOfKind(library.library, 'mosfet').slice(0, 2);
    const outcome = compareParts(design, { role: 'switch', parts: fets, sweep: { points: 20 } });
    if (!outcome.ok) throw new Error(outcome.problems.map((p) => p.message).join(' '));
    const wc = worstCase(design, { tolerances: { rdsOnFraction: 0.1, dcrFraction: 0, esrFraction: 0, inductanceFraction: 0, frequencyFraction: 0 } });
    const mc = monteCarlo(design, { seed: 7, samples: 30, keepSamples: true });
    const model = build('synchronous-buck', { sweepPoints: 20, familyPoints: 10, comparison: outcome.comparison, worstCase: wc, monteCarlo: mc });
    const c = model.comparison!;
    expect(c.alternatives.map((a) => a.partId)).toEqual(fets.map((f) => f.id));
    expect(c.alternatives.map((a) => a.evaluation)).toEqual(outcome.comparison.alternatives.map((a) => a.evaluation));
    expect(c.alternatives[1]!.efficiency).toEqual(outcome.comparison.alternatives[1]!.sweep.points.map((p) => p.efficiency));
    expect(c.crossovers).toEqual(outcome.comparison.crossovers);
    expect(model.tolerance?.worstCase?.cornerCount).toBe(wc.corners.length);
    expect(model.tolerance?.worstCase?.worstEfficiency).toEqual(wc.worstEfficiency);
    expect(model.tolerance?.monteCarlo?.efficiency).toEqual(mc.efficiency);
    expect(model.tolerance?.monteCarlo).not.toHaveProperty('values');
    expect(model.methods.map((m) => m.id)).toEqual(expect.arrayContaining(['comparison', 'tolerance']));
  }, SLOW);
});

describe('buildReport carries the sizing, the design checks and the mission profile (issue 11)', () => {
  it('carries the review as the engine gives it, and no mission profile for a design without one', () => {
    const design = demoDesign('diode-boost');
    const model = build('diode-boost');
    expect(model.review).toEqual(reviewDesign(design)); // independent engine run
    expect(model.mission).toBeNull();
  }, SLOW);

  it('with a profile: the weighted efficiency is Σ fᵢ·ηᵢ over independent evaluations of its rows', () => {
    const design = demoDesign('synchronous-buck');
    const s = design.spec;
    design.missionProfile = {
      name: 'test', hoursPerDay: 10, batteryWh: 50,
      rows: [
        { vinV: s.vinNomV, loadA: 0.1 * s.ratedLoadA, fraction: 0.6 },
        { vinV: s.vinMaxV, loadA: s.ratedLoadA, fraction: 0.4 },
      ],
    };
    const model = buildReport({ design, documentText: designText(design), date: '2026-12-02', appVersion: 'test-version' });
    const e = design.missionProfile.rows.map((r) => evaluate(design, { vinV: r.vinV, loadA: r.loadA })); // independent engine runs
    const weighted = 0.6 * e[0]!.efficiency + 0.4 * e[1]!.efficiency; // ηw = Σ fᵢ·ηᵢ, the form of US 10 CFR 430 Subpart B, Appendix Z
    expect(model.mission?.weightedEfficiency).toBeCloseTo(weighted, 12);
    const lossW = 0.6 * e[0]!.totalLoss + 0.4 * e[1]!.totalLoss; // average loss Σ fᵢ·Ploss,ᵢ (definition)
    expect(model.mission?.energyLostPerDayWh).toBeCloseTo(lossW * 10, 9); // W × h/day = Wh/day (definition)
    expect(model.mission?.battery?.shareLostPerDay).toBeCloseTo((lossW * 10) / 50, 9); // share of a 50 Wh battery (definition)
  }, SLOW);
});
