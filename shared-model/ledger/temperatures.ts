/**
 * PartTemperature and heatsink records from the electro-thermal solution.
 * A capacitor bank's record is one capacitor's hot spot (the bank's dissipation shared by its n parts);
 * its dissipationW is the whole bank's.
 */
import type { Design } from '../design/schema.ts';
import type { ElectroThermalSolution } from '../thermal/fixed-point.ts';
import type { DesignNetwork } from '../thermal/from-design.ts';
import { surfaceTemperature } from '../thermal/network.ts';
import type { Evaluation, PartTemperature } from './types.ts';

export function partTemperatures(design: Design, net: DesignNetwork, sol: ElectroThermalSolution): PartTemperature[] {
  const margin = design.margins.temperatureMarginK;
  return net.nodes.map((node, i) => {
    const celsius = sol.temperaturesC[i]!;
    const power = sol.powersW[i]!;
    const surface = Math.min(surfaceTemperature(net.network, i, celsius, power, sol.sinkTemperaturesC), celsius);
    return {
      part: node.role,
      partName: node.partName,
      kind: node.kind,
      celsius,
      limit: node.limitC,
      marginK: node.limitC - margin - celsius,
      surfaceC: surface,
      dissipationW: power,
      path: node.path,
    };
  });
}

export function heatsinkRecords(net: DesignNetwork, sol: ElectroThermalSolution): Evaluation['heatsinks'] {
  return net.sinks.map((sink, s) => {
    let dissipationW = 0;
    for (let i = 0; i < net.network.size; i++) if (net.network.sinkOf[i] === s) dissipationW += sol.powersW[i]!;
    return { id: sink.id, name: sink.name, celsius: sol.sinkTemperaturesC[s]!, dissipationW };
  });
}
