/**
 * Issue 2 §1: the renderer loads the demo design and shows its operating point as a table; the numbers
 * are the engine's, checked against an independent run of the engine in Node.
 */
import { describe, expect, it } from 'vitest';
import { parseEngineering } from '../../shared-model/index.ts';
import { closeTo } from '../helpers/close-to.ts';
import { readOperatingPoint, valueAtKey } from './helpers/app-page.ts';
import { expectedOperatingPoint } from './helpers/engine.ts';
import { e2eSuite } from './helpers/suite.ts';
import { demoDesign } from '../helpers/demo.ts';

const suite = e2eSuite();

describe('operating-point table of the demo design', () => {
  it('shows every quantity equal to the engine run in Node', () =>
    suite.run(async (app) => {
      const expected = expectedOperatingPoint(demoDesign());
      const rows = await readOperatingPoint(app.page);
      expect(rows.size).toBeGreaterThan(20); // issue 2 §3: duty, ripple, peaks, RMS currents, output ripple, stresses
      for (const key of ['dutyCycle', 'inductor.rmsA', 'inductor.peakA', 'stats.switch.rmsA', 'stats.rectifier.rmsA', 'outputRipple.totalV', 'stress.switchV']) {
        expect(rows.has(key), `row ${key}`).toBe(true); // issue 2 §3 lists these quantities
      }
      for (const row of rows.values()) {
        const engineValue = valueAtKey(expected, row.key);
        closeTo(row.value, engineValue, 1e-12, 1e-15, { row: row.key }); // engine in Node (independent run of shared-model)
        const shown = parseEngineering(row.text, row.unit === '%' ? '' : row.unit);
        expect(shown.ok, `"${row.text}" parses back`).toBe(true);
        if (shown.ok) closeTo(shown.value, engineValue, 5e-4, 1e-9, { row: row.key, text: row.text }); // 4 significant digits shown: half a unit in the 4th digit
      }
      const caption = await app.page.locator('[data-testid="operating-point"] caption').textContent();
      expect(caption).toContain(expected.mode); // engine in Node: CCM or DCM
    }));
});
