/**
 * Issue 5: no way to lose work. A corrupt or wrong-version file shows a clear message and changes
 * nothing; a good file opens from the file chooser or by drag-and-drop; saving downloads the design in
 * browser mode and clears the unsaved marker; a recovery snapshot is offered after a reload.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseDesignText } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { dropFile, field, openThroughChooser, readOperatingPoint, typeInto, valueAtKey } from './helpers/app-page.ts';
import { expectedOperatingPoint } from './helpers/engine.ts';
import { e2eSuite } from './helpers/suite.ts';
import type { Page } from 'playwright-core';
import { demoDesign, demoText } from '../helpers/demo.ts';

const suite = e2eSuite();

async function snapshotOfPage(page: Page) {
  return {
    name: await page.getByTestId('document-name').textContent(),
    unsaved: await page.getByTestId('unsaved-marker').count(),
    designName: await field(page, 'name').inputValue(),
    table: await readOperatingPoint(page),
  };
}

describe('opening files', () => {
  it('refuses a corrupt file with a clear message and changes nothing', () =>
    suite.run(async (app) => {
      const { page } = app;
      await typeInto(page, 'spec.ratedLoadA', '4'); // unsaved work that must survive
      const before = await snapshotOfPage(page);
      const corrupt = demoText().slice(0, 400); // cut short, as a crash during copying leaves it
      await openThroughChooser(page, 'cut-short.json', corrupt);
      const alert = page.getByRole('alert').filter({ hasText: 'cut-short.json' });
      await alert.waitFor();
      const text = (await alert.textContent()) ?? '';
      expect(text).toContain('could not be opened');
      expect(text).toContain('unchanged');
      const engine = parseDesignText(corrupt);
      expect(engine.ok).toBe(false); // shared-model parseDesignText refuses it too
      if (!engine.ok) expect(text).toContain(engine.problems[0]!.message); // the engine's line/column sentence is shown
      expect(await snapshotOfPage(page)).toEqual(before);
      await app.screenshot('open-refused');
    }));

  it('refuses a file from a newer version with a clear message and changes nothing', () =>
    suite.run(async (app) => {
      const { page } = app;
      const before = await snapshotOfPage(page);
      const newer = JSON.stringify({ ...JSON.parse(demoText()), version: 99 });
      await openThroughChooser(page, 'from-the-future.json', newer);
      const alert = page.getByRole('alert').filter({ hasText: 'from-the-future.json' });
      await alert.waitFor();
      expect(await alert.textContent()).toContain('newer version of WattLedger');
      expect(await snapshotOfPage(page)).toEqual(before);
    }));

  it('refuses a file with an invalid field, naming the field, and changes nothing', () =>
    suite.run(async (app) => {
      const { page } = app;
      const before = await snapshotOfPage(page);
      const json = JSON.parse(demoText());
      json.parts.inductor.inductanceH = -4.7e-6;
      await openThroughChooser(page, 'negative-l.json', JSON.stringify(json));
      const alert = page.getByRole('alert').filter({ hasText: 'negative-l.json' });
      await alert.waitFor();
      expect(await alert.textContent()).toContain('parts.inductor.inductanceH'); // rule 6: the message names the field
      expect(await snapshotOfPage(page)).toEqual(before);
    }));

  it('opens a good design dropped on the window and shows its results', () =>
    suite.run(async (app) => {
      const { page } = app;
      await dropFile(page, 'diode-boost.json', demoText('diode-boost'));
      await page.getByTestId('document-name').filter({ hasText: 'diode-boost.json' }).waitFor();
      const boost = demoDesign('diode-boost');
      await expect(field(page, 'name').inputValue()).resolves.toBe(boost.name);
      const expected = expectedOperatingPoint(boost);
      for (const row of (await readOperatingPoint(page)).values()) closeTo(row.value, valueAtKey(expected, row.key), 1e-12, 1e-15, { row: row.key }); // engine in Node
      await expect(page.getByTestId('unsaved-marker').count()).resolves.toBe(0);
    }));
});

describe('saving and recovery', () => {
  it('saves as a download that reads back as the edited design, and clears the unsaved marker', () =>
    suite.run(async (app) => {
      const { page } = app;
      await typeInto(page, 'spec.ratedLoadA', '4');
      await expect(page.getByTestId('unsaved-marker').isVisible()).resolves.toBe(true);
      const download = page.waitForEvent('download');
      await page.keyboard.press('Control+s');
      const file = await download;
      const text = readFileSync((await file.path())!, 'utf8');
      const read = parseDesignText(text);
      expect(read.ok).toBe(true); // shared-model reads what the app wrote
      if (read.ok) expect(read.design).toEqual({ ...demoDesign(), spec: { ...demoDesign().spec, ratedLoadA: 4 } });
      await expect(page.getByTestId('unsaved-marker').count()).resolves.toBe(0);
    }));

  it('offers the unsaved draft after a reload and restores it', () =>
    suite.run(async (app) => {
      const { page } = app;
      page.on('dialog', (dialog) => void dialog.accept()); // the browser's leave-page question
      await typeInto(page, 'spec.ratedLoadA', '2.5');
      await page.reload(); // pagehide writes the snapshot
      const offer = page.getByTestId('recovery-offer');
      await offer.waitFor();
      await app.screenshot('recovery-offer');
      await expect(field(page, 'spec.ratedLoadA').inputValue()).resolves.toBe('5 A'); // nothing restored without asking
      await offer.getByRole('button', { name: 'Restore it' }).click();
      await expect(field(page, 'spec.ratedLoadA').inputValue()).resolves.toBe('2.5 A');
      await expect(page.getByTestId('unsaved-marker').isVisible()).resolves.toBe(true);
      const rows = await readOperatingPoint(page);
      closeTo(rows.get('conditions.loadA')!.value, 2.5, 0, 0); // the restored draft drives the results
    }));
});
