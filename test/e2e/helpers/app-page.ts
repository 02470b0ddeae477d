/**
 * Reading and driving the WattLedger page in end-to-end tests: fields by document path, the
 * operating-point table and the evaluation summary as numbers, files through the chooser or a drop.
 */
import type { Locator, Page } from 'playwright-core';

/** The input, select or check box editing a design field, by its validator path ("spec.voutV"). */
export function field(page: Page, path: string): Locator {
  return page.locator(`[data-path="${path}"]`).first();
}

/** The note under a field (its message), found through aria-describedby. */
export async function fieldNote(page: Page, path: string): Promise<string> {
  const id = await field(page, path).getAttribute('aria-describedby');
  if (!id) return '';
  return ((await page.locator(`[id="${id}"]`).textContent()) ?? '').trim();
}

/**
 * Replaces a field's text as a user would: select all, type key by key (each keystroke updates the
 * design when it parses), then leave the field.
 */
export async function typeInto(page: Page, path: string, text: string, leave = true): Promise<void> {
  const input = field(page, path);
  await input.click();
  await input.press('Control+A');
  await input.pressSequentially(text);
  if (leave) await input.press('Tab');
}

/** Replaces a field's text in one input event, as pasting does, then leaves the field. */
export async function pasteInto(page: Page, path: string, text: string): Promise<void> {
  const input = field(page, path);
  await input.fill(text);
  await input.press('Tab');
}

export interface TableRow {
  key: string;
  value: number;
  unit: string;
  text: string;
}

/** The operating-point table: one entry per row, with the raw SI value and the text shown. */
export async function readOperatingPoint(page: Page): Promise<Map<string, TableRow>> {
  const rows = await page.locator('[data-testid="operating-point"] tr[data-key]').evaluateAll((trs) =>
    trs.map((tr) => {
      const cell = tr.querySelector('td[data-value]') as HTMLElement;
      return {
        key: tr.getAttribute('data-key') ?? '',
        value: Number(cell.dataset.value),
        unit: cell.dataset.unit ?? '',
        text: (cell.textContent ?? '').trim(),
      };
    }),
  );
  return new Map(rows.map((row) => [row.key, row]));
}

/** The headline figures (efficiency, total loss...) by key, as raw numbers. */
export async function readSummary(page: Page): Promise<Map<string, number>> {
  const entries = await page
    .locator('[data-testid="evaluation-summary"] [data-key]')
    .evaluateAll((items) => items.map((item) => [item.getAttribute('data-key') ?? '', Number((item.querySelector('dd') as HTMLElement).dataset.value)] as const));
  return new Map(entries);
}

/** Opens a file through the app's Open button and the browser's file chooser. */
export async function openThroughChooser(page: Page, name: string, text: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Open…' }).click();
  await (await chooser).setFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text) });
}

/** Drops a file onto the window, as dragging it from the desktop does. */
export async function dropFile(page: Page, name: string, text: string): Promise<void> {
  const dataTransfer = await page.evaluateHandle(
    ([fileName, content]) => {
      const transfer = new DataTransfer();
      transfer.items.add(new File([content], fileName, { type: 'application/json' }));
      return transfer;
    },
    [name, text] as const,
  );
  await page.dispatchEvent('main', 'dragenter', { dataTransfer });
  await page.dispatchEvent('main', 'dragover', { dataTransfer });
  await page.dispatchEvent('main', 'drop', { dataTransfer });
}

/** A value read back from the OperatingPoint record by a dotted key ("inductor.rmsA"). */
export function valueAtKey(record: unknown, key: string): number {
  let node = record;
  for (const part of key.split('.')) node = (node as Record<string, unknown>)[part];
  return node as number;
}
