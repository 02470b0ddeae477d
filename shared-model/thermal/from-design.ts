/**
 * The thermal network of a design: one node per part (a capacitor bank is one node whose dissipation is
 * shared equally by its n parts, so each part sees θ·P/n), heatsinks shared by the parts mounted on them.
 *
 * Node resistance (K/W of the node's total dissipation, excluding the shared sink):
 *   direct θJA/n; rise (riseK/atW)/n; heatsink (θJC + θCS)/n with θJC from the part record (MOSFETs and
 *   diodes; the validator allows heatsink paths only for them, other parts count θJC = 0).
 * A heatsink path naming no heatsink (an unvalidated document) is treated as a path to ambient through
 * θJC + θCS alone and flagged with a danger warning: it is optimistic.
 * Source: JEDEC JESD51 definitions; docs/methods.md §10.
 */
import type { Design, Heatsink, Role, SurfaceMaterial, ThermalPath } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';
import type { ThermalNetwork } from './network.ts';

export interface NodeInfo {
  role: Role;
  partName: string;
  /** Temperature limit, °C. */
  limitC: number;
  /** "direct", "rise" or the heatsink id. */
  path: string;
  /** Parts sharing the node's dissipation (capacitor count, else 1). */
  count: number;
  kind: 'junction' | 'hot-spot';
  /** Material of the touchable surface on a heatsink path (the heatsink's), else undefined. */
  sinkSurface?: SurfaceMaterial;
}

export interface DesignNetwork {
  network: ThermalNetwork;
  nodes: NodeInfo[];
  sinks: Heatsink[];
  /** Node index of each role present (−1 when absent). */
  index: Record<Role, number>;
  warnings: Warning[];
}

/** Role order of the nodes (the sense resistor last, when present). */
export const NODE_ROLES: readonly Role[] = [
  'switch',
  'rectifier',
  'inductor',
  'inputCapacitor',
  'outputCapacitor',
  'controller',
  'senseResistor',
];

function thetaJcOf(design: Design, role: Role): number {
  if (role === 'switch') return design.parts.switch.thetaJcKPerW;
  if (role === 'rectifier') return design.parts.rectifier.thetaJcKPerW;
  return 0;
}

function describePart(design: Design, role: Role): { name: string; limitC: number; count: number; kind: NodeInfo['kind'] } {
  const p = design.parts;
  switch (role) {
    case 'switch':
      return { name: p.switch.name, limitC: p.switch.tjMaxC, count: 1, kind: 'junction' };
    case 'rectifier':
      return { name: p.rectifier.name, limitC: p.rectifier.tjMaxC, count: 1, kind: 'junction' };
    case 'inductor':
      return { name: p.inductor.name, limitC: p.inductor.tMaxC, count: 1, kind: 'hot-spot' };
    case 'inputCapacitor':
      return { name: p.inputCapacitor.part.name, limitC: p.inputCapacitor.part.tMaxC, count: p.inputCapacitor.count, kind: 'hot-spot' };
    case 'outputCapacitor':
      return { name: p.outputCapacitor.part.name, limitC: p.outputCapacitor.part.tMaxC, count: p.outputCapacitor.count, kind: 'hot-spot' };
    case 'controller':
      return { name: p.controller.name, limitC: p.controller.tjMaxC, count: 1, kind: 'junction' };
    case 'senseResistor': {
      const r = p.senseResistor!;
      return { name: r.name, limitC: r.zeroPowerC, count: 1, kind: 'hot-spot' };
    }
  }
}

function pathOf(design: Design, role: Role): ThermalPath {
  const paths = design.thermal.paths;
  // A sense resistor without a path of its own is taken as a direct path with the controller's θ (warned).
  return (role === 'senseResistor' ? paths.senseResistor : paths[role]) ?? paths.controller;
}

export function designNetwork(design: Design): DesignNetwork {
  const sinks = design.thermal.heatsinks;
  const own: number[] = [];
  const sinkOf: number[] = [];
  const drop: number[] = [];
  const nodes: NodeInfo[] = [];
  const warnings: Warning[] = [];
  const index: Record<Role, number> = {
    switch: -1, rectifier: -1, inductor: -1, inputCapacitor: -1, outputCapacitor: -1, controller: -1, senseResistor: -1,
  };
  for (const role of NODE_ROLES) {
    if (role === 'senseResistor' && design.parts.senseResistor === undefined) continue;
    const info = describePart(design, role);
    const path = pathOf(design, role);
    const n = info.count;
    index[role] = nodes.length;
    const node: NodeInfo = { role, partName: info.name, limitC: info.limitC, path: path.kind, count: n, kind: info.kind };
    if (role === 'senseResistor' && design.thermal.paths.senseResistor === undefined) {
      warnings.push({
        code: 'model-limit', severity: 'caution', part: role, path: 'thermal.paths.senseResistor',
        message: 'The sense resistor has no thermal path; the controller\'s path is used for it. Give it its own θ.',
      });
    }
    if (path.kind === 'direct') {
      own.push(path.thetaJaKPerW / n);
      sinkOf.push(-1);
      drop.push((path.psiJtKPerW ?? 0) / n);
    } else if (path.kind === 'rise') {
      own.push(path.riseK / path.atW / n);
      sinkOf.push(-1);
      drop.push(0);
    } else {
      const s = sinks.findIndex((h) => h.id === path.heatsinkId);
      own.push((thetaJcOf(design, role) + path.thetaCsKPerW) / n);
      drop.push(0);
      sinkOf.push(s);
      if (s >= 0) {
        node.path = path.heatsinkId;
        node.sinkSurface = sinks[s]!.surface;
      } else {
        warnings.push({
          code: 'model-limit', severity: 'danger', part: role, path: `thermal.paths.${role}.heatsinkId`,
          message: `The heatsink "${path.heatsinkId}" does not exist; the ${role} is computed without it (θJC + θCS to ambient), which is optimistic.`,
        });
      }
    }
    nodes.push(node);
  }
  const sinkKPerW = new Float64Array(sinks.length);
  for (let k = 0; k < sinks.length; k++) sinkKPerW[k] = sinks[k]!.thetaSaKPerW;
  const network: ThermalNetwork = {
    size: nodes.length,
    ownKPerW: new Float64Array(own),
    sinkOf: new Int32Array(sinkOf),
    sinkKPerW,
    surfaceDropKPerW: new Float64Array(drop),
  };
  return { network, nodes, sinks, index, warnings };
}
