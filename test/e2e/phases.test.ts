/**
 * Issue 13 §1 on screen: the interleaving fields of the editor (phases, current-sharing mismatch, phase
 * shedding) with messages naming the on-screen label, the value and the allowed range; a valid phase count
 * changes the whole-converter results.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fieldNote, pasteInto, readSummary } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const PATH_WORDS = /\b(spec|parts|topology|thermal|margins)\.[A-Za-z]/;

async function labelOf(page: Page, path: string): Promise<string> {
  const id = await field(page, path).getAttribute('id');
  return ((await page.locator(`label[for="${id}"]`).first().innerText()) ?? '').replace(/\s*\(optional\)$/, '').trim();
}

async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid="results"]')?.getAttribute('data-settled') === 'true', null, { timeout: 60_000 });
}

describe('interleaving fields in the editor', () => {
  it('name a phase count, mismatch or hysteresis out of range by its label, value and range', () =>
    suite.run(async ({ page }) => {
      const cases = [
        { path: 'topology.phases', text: '9', label: 'Interleaved phases', shows: '9' },
        { path: 'topology.phaseMismatch', text: '0.7', label: 'Current-sharing mismatch', shows: '0.7' },
      ];
      for (const c of cases) {
        await pasteInto(page, c.path, c.text);
        const note = await fieldNote(page, c.path);
        expect(await labelOf(page, c.path)).toBe(c.label);
        expect(note.startsWith(c.label), `note of ${c.path}: ${note}`).toBe(true);
        expect(note).toContain(c.shows);
        expect(note).toMatch(/must be (at least|above) .+ and (at most|below) /);
        expect(note).not.toMatch(PATH_WORDS);
        await expect(field(page, c.path).getAttribute('aria-invalid')).resolves.toBe('true');
      }
      // A fraction of a phase is refused by the field itself, naming the field.
      await pasteInto(page, 'topology.phases', '2.5');
      expect(await fieldNote(page, 'topology.phases')).toMatch(/whole number|integer/i);

      // Phase shedding: the box adds the hysteresis field with its default; out of range is named.
      await page.getByLabel('Shed phases at light load').check();
      const hysteresis = 'topology.phaseShedding.hysteresisFraction';
      await field(page, hysteresis).waitFor();
      expect(Number(await field(page, hysteresis).inputValue())).toBeGreaterThan(0);
      await pasteInto(page, hysteresis, '0.9');
      const note = await fieldNote(page, hysteresis);
      expect(note.startsWith('Shedding hysteresis'), note).toBe(true);
      expect(note).toContain('0.9');
      expect(note).toMatch(/and (at most|below) /);
      expect(note).not.toMatch(PATH_WORDS);
    }));

  it('evaluate the whole converter when the phase count changes', () =>
    suite.run(async ({ page }) => {
      await settled(page);
      const one = await readSummary(page);
      await pasteInto(page, 'topology.phases', '2');
      await page.waitForFunction(
        (before) => {
          const dd = document.querySelector('[data-testid="evaluation-summary"] [data-key="totalLoss"] dd') as HTMLElement | null;
          return dd !== null && Number(dd.dataset.value) !== before;
        },
        one.get('totalLoss'),
        { timeout: 60_000 },
      );
      await settled(page);
      const two = await readSummary(page);
      // Two stages at half the load each: conduction loss (∝ I²) halves per stage, so the whole converter
      // loses differently; the output power (Vout · I) stays the same (common practice: P = V · I).
      expect(two.get('totalLoss')).not.toBeCloseTo(one.get('totalLoss')!, 6);
      await expect(field(page, 'topology.phases').getAttribute('aria-invalid')).resolves.toBe('false');
    }));
});
