/**
 * Issue 11 §4 on screen: the mission-profile editor starts from a published weighting set, takes a
 * battery capacity, and Results → Over the mission shows the weighted efficiency, energy lost per day and
 * battery share the engine computes (the engine run here in Node on the same design); the four-point
 * set's weighted efficiency is the plain mean of the efficiencies at 25, 50, 75 and 100 % load (US 10 CFR
 * 430 Subpart B, Appendix Z). Shares that do not add up to 1 get a message naming the column by its
 * label, the sum and the rule. The suite checks that the page logged no error and met no CSP violation.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { evaluate, evaluateMission, profileFromWeighting } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { demoDesign } from '../helpers/demo.ts';
import { pasteInto } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();

async function figure(page: Page, key: string): Promise<number> {
  const cell = page.locator(`[data-testid="mission-figures"] tr[data-key="${key}"] td[data-value]`);
  await cell.waitFor({ timeout: 60_000 });
  return Number(await cell.getAttribute('data-value'));
}

async function startFromFourPoint(page: Page): Promise<void> {
  await page.locator('#section-mission').scrollIntoViewIfNeeded();
  await page.getByTestId('mission-set').selectOption('four-point');
  await page.locator('[data-testid="mission-rows"] tbody tr').nth(3).waitFor({ timeout: 30_000 });
}

describe('the mission profile on screen', () => {
  it('a published set and a battery capacity give the engine\'s weighted figures', () =>
    suite.run(async ({ page }) => {
      await startFromFourPoint(page);
      await expect(page.locator('[data-testid="mission-rows"] tbody tr').count()).resolves.toBe(4); // 25, 50, 75, 100 % (10 CFR 430 App. Z)
      await expect(page.getByTestId('mission-sum').textContent()).resolves.toMatch(/Σ 100 %/);
      await pasteInto(page, 'missionProfile.batteryWh', '20');
      await page.locator('#results-mission').scrollIntoViewIfNeeded();
      await page.locator('[data-testid="mission-figures"] tr[data-key="battery"] td[data-value]').waitFor({ timeout: 60_000 });

      const d = demoDesign(); // the design the app opens with
      d.missionProfile = { ...profileFromWeighting(d, 'four-point'), batteryWh: 20 };
      const engine = evaluateMission(d); // the engine in Node
      const weighted = await figure(page, 'weighted');
      closeTo(weighted, engine.weightedEfficiency, 1e-9); // the worker runs the same engine in Chromium's V8
      const mean = [0.25, 0.5, 0.75, 1].map((k) => evaluate(d, { vinV: d.spec.vinNomV, loadA: k * d.spec.ratedLoadA }).efficiency).reduce((a, b) => a + b) / 4;
      closeTo(weighted, mean, 1e-9); // average of 25/50/75/100 % load efficiencies, US 10 CFR 430 Subpart B, Appendix Z
      closeTo(await figure(page, 'per-day'), engine.energyLostPerDayWh, 1e-9); // Wh per day = average loss × 24 h (definition)
      closeTo(await figure(page, 'battery'), engine.energyLostPerDayWh / 20, 1e-9); // share of a 20 Wh battery (definition)
      const rows = page.locator('[data-testid="mission-temperatures"] tbody tr');
      await expect(rows.count()).resolves.toBe(engine.temperatures.length);
      const worst = engine.temperatures[0]!;
      closeTo(Number(await page.locator(`[data-testid="mission-temperatures"] tr[data-part="${worst.part}"] td[data-value]`).nth(1).getAttribute('data-value')), worst.worstC, 1e-9);
      await expect(page.locator('#results-mission [data-testid="cautions"]').textContent()).resolves.toMatch(/Estimates only/); // team rules: cautions
    }));

  it('shares that do not add up to 1 are refused naming the column, the sum and the rule', () =>
    suite.run(async ({ page }) => {
      await startFromFourPoint(page);
      await pasteInto(page, 'missionProfile.rows[0].fraction', '0.5'); // 0.5 + 3 × 0.25 = 1.25
      const problems = page.getByTestId('mission-problems');
      await problems.waitFor({ timeout: 30_000 });
      const text = ((await problems.textContent()) ?? '').replace(/\s+/g, ' ');
      expect(text).toContain('Mission profile — Share of time'); // the column's on-screen label
      expect(text).toContain('add up to 1.25'); // the value
      expect(text).toMatch(/must add up to 1 \(within ±0\.001\)/); // the allowed range
      await expect(page.getByTestId('mission-sum').textContent()).resolves.toMatch(/Σ 125 %/);
      await expect(page.getByTestId('stale-note').isVisible()).resolves.toBe(true); // the results keep the last valid design
    }));
});
