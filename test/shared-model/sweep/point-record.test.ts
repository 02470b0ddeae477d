/**
 * The sweep's columns come from the first point (sweep/point-record.ts): a design's loss terms, parts and
 * heat sinks do not change with the operating point (ledger/slots.ts), so a point in the discontinuous
 * mode and one in the continuous mode give the same columns whichever comes first.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, evaluate } from '../../../shared-model/index.ts';
import { ColumnBook } from '../../../shared-model/sweep/point-record.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('a sweep point record', () => {
  for (const { id } of DEMO_DESIGNS) {
    it(`${id}: the first point, light or heavy, already has every column`, () => {
      const d = demoDesign(id);
      const rated = d.spec.ratedLoadA;
      const light = evaluate(d, { loadA: 0.003 * rated });
      const heavy = evaluate(d, { loadA: 1.5 * rated });
      // Control: the two points really are in different modes for the designs that can leave CCM, so the
      // test would see a mode-dependent term (docs/methods.md §2: DCM when K < Kcrit at light load).
      if (d.topology.rectifier === 'diode' || d.topology.lightLoad === 'diode-emulation') expect(light.conductionMode).not.toBe(heavy.conductionMode);
      for (const [first, second] of [[light, heavy], [heavy, light]] as const) {
        const book = new ColumnBook();
        book.record(first);
        const after = structuredClone(book.columns);
        book.record(second);
        expect(book.columns).toEqual(after); // our own rule (ledger/slots.ts): the set of terms depends only on the design
      }
    });
  }
});
