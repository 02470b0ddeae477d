/**
 * The steady-state thermal network: every heat source (a part, or a bank of identical capacitors) is a node
 * with its own thermal resistance to either ambient or a heatsink; a heatsink collects the heat of all
 * the parts mounted on it.
 *
 * Formula (JEDEC JESD51 definitions; docs/methods.md §10):
 *   direct:   Tj = Ta + P · θJA                          ("rise" paths: θ = rise / stated dissipation)
 *   heatsink: Ts = Ta + θSA · ΣPi,  Tj,i = Ts + Pi · (θJC,i + θCS,i)
 * Surface temperature (what a hand could touch): the heatsink for heatsink paths; the case top
 * Tj − ψJT · P for direct paths that give ψJT; otherwise the junction/hot-spot temperature itself
 * (conservative). Check: P (3, 1) W, θJC (1.5, 4.0), θCS (0.5, 1.0), θSA 4 K/W, Ta 25 °C → Ts 41 °C,
 * Tj (47, 46) °C.
 * Assumptions: linear, steady state; θJA describes the actual board (JESD51 θJA is for comparing
 * packages — the user's value is taken as given); no coupling between parts except through a shared sink.
 */

export interface ThermalNetwork {
  /** Node count. */
  size: number;
  /** K/W from the node's dissipation to its temperature, excluding the shared heatsink. */
  ownKPerW: Float64Array;
  /** Heatsink index of each node, or −1 for a path to ambient. */
  sinkOf: Int32Array;
  /** θSA of each heatsink, K/W. */
  sinkKPerW: Float64Array;
  /** Surface temperature = node temperature − surfaceDropKPerW · P (direct paths with ψJT). */
  surfaceDropKPerW: Float64Array;
}

/** A network from plain arrays (sinkOf entries −1 for ambient). */
export function thermalNetwork(
  ownKPerW: readonly number[],
  sinkOf: readonly number[],
  sinkKPerW: readonly number[],
  surfaceDropKPerW?: readonly number[],
): ThermalNetwork {
  return {
    size: ownKPerW.length,
    ownKPerW: Float64Array.from(ownKPerW),
    sinkOf: Int32Array.from(sinkOf),
    sinkKPerW: Float64Array.from(sinkKPerW),
    surfaceDropKPerW: Float64Array.from(surfaceDropKPerW ?? ownKPerW.map(() => 0)),
  };
}

/**
 * Node and heatsink temperatures for node dissipations `powers` (W): fills `temps` (°C, one per node) and
 * `sinkTemps` (°C, one per heatsink).
 */
export function networkTemperatures(
  net: ThermalNetwork,
  ambientC: number,
  powers: Float64Array,
  temps: Float64Array,
  sinkTemps: Float64Array,
): void {
  sinkTemps.fill(0);
  for (let i = 0; i < net.size; i++) {
    const s = net.sinkOf[i]!;
    if (s >= 0) sinkTemps[s] = sinkTemps[s]! + powers[i]!;
  }
  for (let s = 0; s < net.sinkKPerW.length; s++) sinkTemps[s] = ambientC + net.sinkKPerW[s]! * sinkTemps[s]!;
  for (let i = 0; i < net.size; i++) {
    const s = net.sinkOf[i]!;
    temps[i] = (s >= 0 ? sinkTemps[s]! : ambientC) + net.ownKPerW[i]! * powers[i]!;
  }
}

/** Surface temperature of node i, °C, given its temperature and dissipation. */
export function surfaceTemperature(net: ThermalNetwork, i: number, tempC: number, powerW: number, sinkTemps: Float64Array): number {
  const s = net.sinkOf[i]!;
  if (s >= 0) return sinkTemps[s]!;
  return tempC - net.surfaceDropKPerW[i]! * powerW;
}

/**
 * surfaceTemperature of node i with its temperature and dissipation read from the network's arrays
 * (numbers stay in the arrays: no call boundary to box them on the heap in a loop over many points).
 */
export function surfaceTemperatureAt(net: ThermalNetwork, i: number, temps: Float64Array, powers: Float64Array, sinkTemps: Float64Array): number {
  return surfaceTemperature(net, i, temps[i]!, powers[i]!, sinkTemps);
}
