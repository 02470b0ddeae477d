/**
 * PartTemperature and heatsink records from the electro-thermal solution.
 * A capacitor bank's record is one capacitor's hot spot (the bank's dissipation shared by its n parts);
 * its dissipationW is the whole bank's. A sweep refills one set of records per point (`partTemperaturesInto`).
 */
import type { Design } from '../design/schema.ts';
import type { ElectroThermalSolution } from '../thermal/fixed-point.ts';
import type { DesignNetwork } from '../thermal/from-design.ts';
import { surfaceTemperature } from '../thermal/network.ts';
import type { Evaluation, PartTemperature } from './types.ts';

/** Fills `t` with node i's record (every field written); returns t. */
function fillPartTemperature(design: Design, net: DesignNetwork, sol: ElectroThermalSolution, i: number, t: PartTemperature): PartTemperature {
  const node = net.nodes[i]!;
  const celsius = sol.temperaturesC[i]!;
  const power = sol.powersW[i]!;
  t.part = node.role;
  t.partName = node.partName;
  t.kind = node.kind;
  t.celsius = celsius;
  t.limit = node.limitC;
  t.marginK = node.limitC - design.margins.temperatureMarginK - celsius;
  t.surfaceC = consistentSurface(net, sol, i, celsius, power);
  t.dissipationW = power;
  t.path = node.path;
  return t;
}

/**
 * The touchable surface on the same thermal path as the part's reported temperature: between ambient and
 * the junction (or hot spot). A heatsink path reads the heatsink; a direct path with ψJT reads
 * Tj − ψJT·P with P the power that path carries to reach the reported Tj — (Tj − Ta)/θ when the record's
 * Tj is capped in runaway (the drop of an uncapped power would put the case below ambient, even at
 * hundreds of kelvin below zero). Never below ambient, never above the part itself.
 */
function consistentSurface(net: DesignNetwork, sol: ElectroThermalSolution, i: number, celsius: number, power: number): number {
  const ambient = sol.ambientC;
  const own = net.network.ownKPerW[i]!;
  const base = net.network.sinkOf[i]! >= 0 ? celsius - own * power : ambient;
  const carried = own > 0 ? Math.min(power, Math.max(celsius - base, 0) / own) : power;
  const surface = surfaceTemperature(net.network, i, celsius, carried, sol.sinkTemperaturesC);
  return Math.min(Math.max(surface, ambient), Math.max(celsius, ambient));
}

const newPartTemperature = (): PartTemperature => ({
  part: 'switch', partName: '', kind: 'junction', celsius: 0, limit: 0, marginK: 0, surfaceC: 0, dissipationW: 0, path: '',
});

export function partTemperatures(design: Design, net: DesignNetwork, sol: ElectroThermalSolution): PartTemperature[] {
  return net.nodes.map((_, i) => fillPartTemperature(design, net, sol, i, newPartTemperature()));
}

/** partTemperatures into `out` (one record per node, made on the first call); returns out. */
export function partTemperaturesInto(design: Design, net: DesignNetwork, sol: ElectroThermalSolution, out: PartTemperature[]): PartTemperature[] {
  for (let i = 0; i < net.nodes.length; i++) {
    if (out.length <= i) out.push(newPartTemperature());
    fillPartTemperature(design, net, sol, i, out[i]!);
  }
  return out;
}

export function heatsinkRecords(net: DesignNetwork, sol: ElectroThermalSolution): Evaluation['heatsinks'] {
  return net.sinks.map((sink, s) => {
    let dissipationW = 0;
    for (let i = 0; i < net.network.size; i++) if (net.network.sinkOf[i] === s) dissipationW += sol.powersW[i]!;
    return { id: sink.id, name: sink.name, celsius: sol.sinkTemperaturesC[s]!, dissipationW };
  });
}
