import { describe, expect, it } from 'vitest';
import { networkTemperatures, surfaceTemperature, thermalNetwork } from '../../../shared-model/thermal/network.ts';
import { designNetwork } from '../../../shared-model/thermal/from-design.ts';
import { SYNC_BUCK, design, sharedSink } from '../../helpers/ledger-designs.ts';
import { closeTo } from '../../helpers/close-to.ts';

describe('thermal network', () => {
  it('solves the docs/methods.md §10 shared sink: Ts 41 °C, Tj 47 and 46 °C', () => {
    // P (3, 1) W, θJC (1.5, 4.0), θCS (0.5, 1.0), θSA 4 K/W, Ta 25 °C
    const net = thermalNetwork([1.5 + 0.5, 4.0 + 1.0], [0, 0], [4]);
    const temps = new Float64Array(2);
    const sinks = new Float64Array(1);
    networkTemperatures(net, 25, Float64Array.of(3, 1), temps, sinks);
    closeTo(sinks[0]!, 41, 1e-12); // docs/methods.md §10: Ts = Ta + θSA·ΣP = 41 °C
    closeTo(temps[0]!, 47, 1e-12); // docs/methods.md §10: Tj = Ts + P·(θJC + θCS) = 47 °C
    closeTo(temps[1]!, 46, 1e-12); // docs/methods.md §10: 46 °C
    expect(surfaceTemperature(net, 0, temps[0]!, 3, sinks)).toBe(41); // the touchable surface of a sink-mounted part is the sink
  });
  it('takes the case top as Tj − ψJT·P on a direct path', () => {
    const net = thermalNetwork([40], [-1], [], [2]);
    const temps = new Float64Array(1);
    networkTemperatures(net, 25, Float64Array.of(1.5), temps, new Float64Array(0));
    closeTo(temps[0]!, 25 + 40 * 1.5, 1e-12); // JESD51: Tj = Ta + P·θJA (docs/methods.md §10)
    closeTo(surfaceTemperature(net, 0, temps[0]!, 1.5, new Float64Array(0)), temps[0]! - 2 * 1.5, 1e-12); // JESD51: Tcase,top = Tj − ψJT·P
  });
});

describe('network of a design', () => {
  it('divides a capacitor bank’s θ by its count and shares the sink between the FETs', () => {
    const d = design(SYNC_BUCK, (x) => {
      x.parts.inputCapacitor.count = 4;
      x.thermal.paths.inputCapacitor = { kind: 'direct', thetaJaKPerW: 80 };
      sharedSink(x, 3, 0.7);
    });
    const n = designNetwork(d);
    const cin = n.index.inputCapacitor;
    closeTo(n.network.ownKPerW[cin]!, 80 / 4, 1e-12); // bank of n parts: each carries P/n through its own θ (from-design.ts header)
    const sw = n.index.switch;
    closeTo(n.network.ownKPerW[sw]!, d.parts.switch.thetaJcKPerW + 0.7, 1e-12); // docs/methods.md §10: θJC + θCS to the sink
    expect(n.network.sinkOf[sw]).toBe(n.network.sinkOf[n.index.rectifier]);
    expect(n.nodes[sw]!.path).toBe('sink');
  });
  it('flags a heatsink path that names no heatsink instead of throwing', () => {
    const d = design(SYNC_BUCK, (x) => {
      x.thermal.paths.switch = { kind: 'heatsink', heatsinkId: 'missing', thetaCsKPerW: 0.5 };
    });
    const n = designNetwork(d);
    expect(n.warnings.some((w) => w.severity === 'danger' && w.path === 'thermal.paths.switch.heatsinkId')).toBe(true);
  });
});
