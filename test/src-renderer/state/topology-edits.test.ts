import { describe, expect, it } from 'vitest';
import { validateDesign } from '../../../shared-model/index.ts';
import { stashRemoved, withRectifier, withSenseLocation } from '../../../src-renderer/state/topology-edits.ts';
import { demoDesign, demoParts } from '../../helpers/demo.ts';

describe('edits that keep the document whole', () => {
  it('switching to a diode rectifier puts a diode in and keeps the MOSFET for switching back', () => {
    const design = demoDesign(); // synchronous demo
    const toDiode = withRectifier(design, 'diode', {}, demoParts());
    expect(toDiode.design.parts.rectifier.kind).toBe('diode');
    expect(validateDesign(toDiode.design).ok).toBe(true); // the engine accepts the result
    const stash = stashRemoved({}, toDiode.removed);
    const back = withRectifier(toDiode.design, 'synchronous', stash, demoParts());
    expect(back.design.parts.rectifier).toEqual(design.parts.rectifier);
  });

  it('removing the sense resistor removes its thermal path, and moving it back restores both', () => {
    const design = demoDesign();
    expect(design.parts.senseResistor).toBeDefined();
    const none = withSenseLocation(design, 'none', {}, demoParts());
    expect(none.design.parts.senseResistor).toBeUndefined();
    expect(none.design.thermal.paths.senseResistor).toBeUndefined();
    expect(validateDesign(none.design).ok).toBe(true);
    const back = withSenseLocation(none.design, 'inductor', stashRemoved({}, none.removed), demoParts());
    expect(back.design.parts.senseResistor).toEqual(design.parts.senseResistor);
    expect(back.design.thermal.paths.senseResistor).toEqual(design.thermal.paths.senseResistor);
  });

  it('changes nothing when the setting is already the one asked for', () => {
    const design = demoDesign();
    expect(withRectifier(design, design.topology.rectifier, {}, []).design).toBe(design);
  });
});
