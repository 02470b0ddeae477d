/**
 * Issue 16 §2: errors in the user's words, on the field the user touched. Every invalid entry is
 * named on screen by its field's visible label (never the document path, which stays in the CLI and
 * JSON); a rule relating two fields is shown on the field that was edited, with the partner marked as
 * related; a refusal to save leaves once the draft is valid, and the editor's list links to each field.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { field, fieldNote, pasteInto } from './helpers/app-page.ts';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();
const PATH_WORDS = /\b(spec|parts|topology|thermal|margins)\.[A-Za-z]/; // a validator path, e.g. "parts.inductor.inductanceH"

/** The visible label of the field at a path (its <label for>). */
async function labelOf(page: Page, path: string): Promise<string> {
  const id = await field(page, path).getAttribute('id');
  return ((await page.locator(`label[for="${id}"]`).first().innerText()) ?? '').replace(/\s*\(optional\)$/, '').trim();
}

async function openPart(page: Page, role: string): Promise<void> {
  await page.locator('summary', { hasText: role }).first().click();
}

describe('field errors on screen', () => {
  it('name every invalid field by its on-screen label, never by its path', () =>
    suite.run(async ({ page }) => {
      await openPart(page, 'Inductor');
      const cases = [
        { path: 'parts.inductor.inductanceH', text: '-4.7u', section: 'Inductor', shows: '−4.7 µH' },
        { path: 'spec.switchingFrequencyHz', text: '0', section: '', shows: '0 Hz' },
        { path: 'spec.ambientC', text: '900', section: '', shows: '900 °C' },
        { path: 'topology.deadTimeBeforeOnS', text: '-5n', section: '', shows: '−5 ns' },
      ];
      for (const c of cases) {
        await pasteInto(page, c.path, c.text);
        const note = await fieldNote(page, c.path);
        const label = await labelOf(page, c.path);
        expect(note.startsWith(c.section ? `${c.section} — ${label}` : label), `note of ${c.path}: ${note}`).toBe(true); // issue 16 §2
        expect(note).toContain(c.shows); // the value as typed, in engineering notation
        expect(note).toMatch(/must be (at least|above) .+ and (at most|below) /); // the allowed range in words
        expect(note).not.toMatch(PATH_WORDS);
        await expect(field(page, c.path).getAttribute('aria-invalid')).resolves.toBe('true');
      }
      const summary = page.getByRole('status', { name: 'Invalid fields' });
      const items = await summary.getByRole('listitem').allInnerTexts();
      expect(items).toHaveLength(cases.length);
      for (const item of items) expect(item).not.toMatch(PATH_WORDS);
      await summary.getByRole('button', { name: /Inductor — Inductance/ }).click();
      await expect(page.evaluate(() => document.activeElement?.getAttribute('data-path'))).resolves.toBe('parts.inductor.inductanceH'); // the list links to the field
    }));

  it('shows a rule relating two fields on the field that was edited, and marks the other as related', () =>
    suite.run(async ({ page }) => {
      await pasteInto(page, 'spec.vinMinV', '20');
      const edited = await fieldNote(page, 'spec.vinMinV');
      expect(edited).toContain('Input voltage, highest'); // the rule names the partner by its label
      expect(edited).not.toMatch(PATH_WORDS);
      await expect(field(page, 'spec.vinMinV').getAttribute('aria-invalid')).resolves.toBe('true');
      await expect(field(page, 'spec.vinMaxV').getAttribute('aria-invalid')).resolves.toBe('false');
      expect(await fieldNote(page, 'spec.vinMaxV')).toContain('Related to the problem shown at “Input voltage, lowest”');

      await pasteInto(page, 'spec.vinMaxV', '10');
      await expect(field(page, 'spec.vinMaxV').getAttribute('aria-invalid')).resolves.toBe('true'); // now the highest was edited
      await expect(field(page, 'spec.vinMinV').getAttribute('aria-invalid')).resolves.toBe('false');
    }));

  it('lets a refusal to save leave once the draft is valid, and keeps one such message at a time', () =>
    suite.run(async ({ page }) => {
      await pasteInto(page, 'spec.voutV', '-1');
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      const refusals = page.getByTestId('message-error').filter({ hasText: 'was not saved' });
      await refusals.first().waitFor();
      expect(await refusals.count()).toBe(1); // the second refusal replaced the first
      expect(await refusals.innerText()).toContain('Output voltage: −1 V');
      await pasteInto(page, 'spec.voutV', '3.3');
      await refusals.first().waitFor({ state: 'detached' }); // left when the field became valid
    }));
});
