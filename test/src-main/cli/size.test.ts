/**
 * `wattledger size` and the design checks in `evaluate --json`: the records are the engine's unchanged,
 * the figures meet the hand calculations of a near-lossless design, and bad input names its field.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign, reviewDesign } from '../../../shared-model/index.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign, demoText } from '../../helpers/demo.ts';
import { nearIdealDesign } from '../../helpers/near-ideal.ts';
import { memoryIo } from './memory-io.ts';

// Buck 8–16 V → 5 V, 3 A, 500 kHz, 4.7 µH with near-zero losses (the ideal formulas then hold).
const buck = nearIdealDesign({ kind: 'buck', rectifier: 'synchronous', vinV: 12, vinMinV: 8, vinMaxV: 16, voutV: 5, loadA: 3, fsHz: 500e3, inductanceH: 4.7e-6, outputCapacitanceF: 47e-6 });
buck.spec.targets = { inductorRippleRatio: 0.3, outputRippleV: 0.02 };
const lNeeded = ((16 - 5) * (5 / 16)) / (0.3 * 3 * 500e3); // L = (Vin − Vo)·D/(r·Io·fs) at Vin max = 7.639 µH, Erickson & Maksimović ch. 2

describe('wattledger size', () => {
  it('prints the sizing and the checks as JSON, the engine\'s records unchanged', async () => {
    const io = memoryIo({ 'd.json': demoText('diode-boost') });
    expect(await runCli(['size', 'd.json', '--json'], io)).toBe(EXIT.ok); // a failed check is a finding, exit 0
    const out = JSON.parse(io.stdout);
    const engine = JSON.parse(JSON.stringify(reviewDesign(demoDesign('diode-boost'))));
    expect(out.sizing).toEqual(engine.sizing); // the CLI adds nothing to the engine
    expect(out.checks).toEqual(engine.checks); // the CLI adds nothing to the engine
    expect(out.designChecks).toEqual(out.checks); // the older name, the same list
    expect(out.checkCounts.pass + out.checkCounts.warn + out.checkCounts.fail).toBe(out.checks.length);
    expect(out.cautions.join(' ')).toMatch(/Estimates only/); // team rules: cautions
  });

  it('meets the hand sizing of a buck: the inductance for 30 % ripple, and the check names it', async () => {
    const io = memoryIo({ 'd.json': JSON.stringify(buck) });
    expect(await runCli(['size', 'd.json', '--json'], io)).toBe(EXIT.ok);
    const out = JSON.parse(io.stdout);
    closeTo(out.sizing.inductor.requiredInductanceH.value, lNeeded, 3e-3); // Erickson & Maksimović ch. 2
    expect(out.sizing.inductor.requiredInductanceH.corner).toBe('vin-max'); // (Vin − Vo)·D grows with Vin (Erickson & Maksimović ch. 2)
    const ripple = out.designChecks.find((c: { id: string }) => c.id === 'inductor-ripple-ratio');
    closeTo(ripple.value, ((16 - 5) * (5 / 16)) / (4.7e-6 * 500e3) / 3, 2e-3); // ΔI/Io at Vin max, Erickson & Maksimović ch. 2
    expect(ripple.status).toBe('fail'); // 0.488 > 0.3
  });

  it('prints tables: each result with its corner, the checks with their result, the findings and the cautions', async () => {
    const io = memoryIo({ 'd.json': JSON.stringify(buck) });
    expect(await runCli(['size', 'd.json'], io)).toBe(EXIT.ok);
    expect(io.stdout).toMatch(/Inductance for the ripple target\s+7\.639 µH\s+vin-max/); // hand value above, 4 figures
    expect(io.stdout).toMatch(/Inductor ripple ratio .*FAIL/);
    expect(io.stdout).toMatch(/the target 30 % needs 7\.64 µH/); // issue 11 §2 sentence
    expect(io.stdout).toMatch(/Design checks: \d+ pass, \d+ warn, [1-9]\d* fail/);
    expect(io.stdout).toMatch(/Caution: Estimates only/); // team rules: cautions
  });

  it('refuses an invalid design naming the field, the value and the allowed range', async () => {
    const bad = JSON.parse(JSON.stringify(buck));
    bad.spec.ratedLoadA = -3;
    const io = memoryIo({ 'd.json': JSON.stringify(bad) });
    expect(await runCli(['size', 'd.json'], io)).toBe(EXIT.invalidDesign);
    expect(io.stderr).toMatch(/spec\.ratedLoadA/); // the field
    expect(io.stderr).toMatch(/-3/); // the value
    expect(io.stdout).toBe('');
  });
});

describe('wattledger evaluate --json carries the design checks', () => {
  it('every item has id, value, limit, unit, passed and source (issue 11, done when)', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['evaluate', 'd.json', '--json'], io)).toBe(EXIT.ok);
    const out = JSON.parse(io.stdout);
    expect(out.checks.length).toBeGreaterThan(10); // issue 11 §2 lists more than ten kinds
    for (const c of out.checks) {
      expect(Object.keys(c)).toEqual(expect.arrayContaining(['id', 'value', 'limit', 'unit', 'passed', 'source'])); // issue 11 "Done when"
      expect(typeof c.passed).toBe('boolean'); // issue 11 "Done when": pass/fail
      expect(c.source.length).toBeGreaterThan(0); // issue 11 §2: each check names its source
    }
    expect(out.checks.map((c: { id: string }) => c.id)).toContain('efficiency-at-rated'); // the demo sets an efficiency target
    expect(out.designChecks).toEqual(out.checks); // the older name stays, the same list (src-main/cli/README.md)
    const engine = JSON.parse(JSON.stringify(evaluateDesign(demoDesign('synchronous-buck')).evaluation));
    expect(out.ratingChecks).toEqual(engine.checks); // the ledger's own rating checks, moved, unchanged
    expect(out.ratingChecks.length).toBeGreaterThan(0);
  });
});

describe('--current-derating and --voltage-derating on size and evaluate', () => {
  it('size: the option replaces the design\'s derating for this run', async () => {
    const io = memoryIo({ 'd.json': JSON.stringify(buck) });
    expect(await runCli(['size', 'd.json', '--json', '--current-derating', '50%'], io)).toBe(EXIT.ok);
    const out = JSON.parse(io.stdout);
    expect(out.sizing.stresses.currentDerating).toBe(0.5);
    const peak = 3 + ((16 - 5) * (5 / 16)) / (4.7e-6 * 500e3) / 2; // Io + ΔI/2 at Vin max, Erickson & Maksimović ch. 2
    closeTo(out.sizing.stresses.required.switchIdA, peak / 0.5, 3e-3); // rating needed = stress / derating (common practice)
  });

  it('evaluate: --voltage-derating moves the limit of the switch-voltage check', async () => {
    const io = memoryIo({ 'd.json': JSON.stringify(buck) });
    expect(await runCli(['evaluate', 'd.json', '--json', '--voltage-derating', '0.5'], io)).toBe(EXIT.ok);
    const out = JSON.parse(io.stdout);
    const c = out.checks.find((k: { id: string }) => k.id === 'switch-voltage');
    closeTo(c.limit, buck.parts.switch.kind === 'mosfet' ? buck.parts.switch.vdsRatingV * 0.5 : NaN, 1e-12); // rating × derating (common practice)
  });

  it('refuses a derating out of range naming the option, its on-screen label, the value and the range', async () => {
    const io = memoryIo({ 'd.json': JSON.stringify(buck) });
    expect(await runCli(['size', 'd.json', '--current-derating', '1.5'], io)).toBe(EXIT.usage);
    expect(io.stderr).toContain('--current-derating'); // the option
    expect(io.stderr).toContain('Usable share of current ratings'); // the editor's label
    expect(io.stderr).toContain('1.5'); // the value
    expect(io.stderr).toMatch(/0\.1 ≤ --current-derating ≤ 1/); // the range of margins.currentDerating
    expect(io.stdout).toBe('');
  });
});
