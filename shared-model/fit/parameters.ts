/**
 * The model parameters a calibration may move, and how each one changes a design. Most are multipliers
 * on datasheet values (1 = as the datasheet says), which keeps every parameter of order one for the
 * solver (docs/methods.md §18); the controller's quiescent current is in amperes.
 *   switchRdsOn      × RDS(on) of the control switch
 *   rectifierRdsOn   × RDS(on) of a synchronous rectifier
 *   rectifierDrop    × VF0 of a rectifier diode
 *   switchCharge     × every gate charge of the control switch (Qg, Qgs, Qgs2, Qgd): transition time and drive
 *   coreLoss         × the core-loss coefficient (Steinmetz k, or the datasheet point's loss density)
 *   windingDcr       × the winding's DCR at 20 °C
 *   quiescent        the controller's quiescent current, A
 *   thermal.<role>   × the thermal resistance from that part's measured surface to ambient
 *                    (θJA of a direct path, the stated rise of a rise path, θSA of its heatsink)
 * Bounds (our own rule): multipliers 0.2 … 5, quiescent 0 … 100 mA (its design range).
 */
import type { Design, Role } from '../design/schema.ts';
import { ROLE_LABELS } from '../report/labels.ts';

export type FitParameterName =
  | 'switchRdsOn' | 'rectifierRdsOn' | 'rectifierDrop' | 'switchCharge' | 'coreLoss' | 'windingDcr' | 'quiescent'
  | `thermal.${Role}`;

export interface FitParameter {
  name: FitParameterName;
  /** On-screen label. */
  label: string;
  /** '×' for a multiplier, else the unit of the value. */
  unit: string;
  /** Value of the unmodified design (1 for a multiplier). */
  initial: number;
  lower: number;
  upper: number;
  /** Typical size, for scaling the solver's steps. */
  typical: number;
  /** The design with this parameter at `value` (a new object; the input is unchanged). */
  apply(design: Design, value: number): Design;
}

export const SCALE_BOUNDS = { lower: 0.2, upper: 5 } as const;
const QUIESCENT_MAX_A = 0.1;

const scaled = (name: FitParameterName, label: string, apply: FitParameter['apply']): FitParameter => ({
  name, label, unit: '×', initial: 1, lower: SCALE_BOUNDS.lower, upper: SCALE_BOUNDS.upper, typical: 1, apply,
});

function withParts(design: Design, parts: Partial<Design['parts']>): Design {
  return { ...design, parts: { ...design.parts, ...parts } };
}

function thermalParameter(design: Design, role: Role): FitParameter | undefined {
  const path = design.thermal.paths[role];
  if (!path) return undefined;
  return scaled(`thermal.${role}`, `Thermal resistance to ambient, ${ROLE_LABELS[role].toLowerCase()} ×`, (d, k) => {
    const p = d.thermal.paths[role];
    if (!p) return d;
    if (p.kind === 'heatsink') {
      const heatsinks = d.thermal.heatsinks.map((h) => (h.id === p.heatsinkId ? { ...h, thetaSaKPerW: h.thetaSaKPerW * k } : h));
      return { ...d, thermal: { ...d.thermal, heatsinks } };
    }
    const moved = p.kind === 'direct' ? { ...p, thetaJaKPerW: p.thetaJaKPerW * k } : { ...p, riseK: p.riseK * k };
    return { ...d, thermal: { ...d.thermal, paths: { ...d.thermal.paths, [role]: moved } } };
  });
}

/** Every parameter the design offers, in a fixed order. */
export function fitParameters(design: Design): FitParameter[] {
  const out: FitParameter[] = [
    scaled('switchRdsOn', 'RDS(on) of the switch ×', (d, k) => withParts(d, { switch: { ...d.parts.switch, rdsOn25Ohm: d.parts.switch.rdsOn25Ohm * k } })),
  ];
  if (design.parts.rectifier.kind === 'mosfet')
    out.push(scaled('rectifierRdsOn', 'RDS(on) of the rectifier ×', (d, k) =>
      d.parts.rectifier.kind === 'mosfet' ? withParts(d, { rectifier: { ...d.parts.rectifier, rdsOn25Ohm: d.parts.rectifier.rdsOn25Ohm * k } }) : d));
  else
    out.push(scaled('rectifierDrop', 'Forward drop VF0 of the rectifier ×', (d, k) =>
      d.parts.rectifier.kind === 'diode' ? withParts(d, { rectifier: { ...d.parts.rectifier, vf0V: d.parts.rectifier.vf0V * k } }) : d));
  out.push(
    scaled('switchCharge', 'Gate charges of the switch (transition time) ×', (d, k) => {
      const s = d.parts.switch;
      return withParts(d, {
        switch: {
          ...s,
          qgC: s.qgC * k,
          qgdC: s.qgdC * k,
          ...(s.qgsC !== undefined ? { qgsC: s.qgsC * k } : {}),
          ...(s.qgs2C !== undefined ? { qgs2C: s.qgs2C * k } : {}),
        },
      });
    }),
    scaled('coreLoss', 'Core loss ×', (d, k) => {
      const c = d.parts.inductor.coreLoss;
      const coreLoss = c.kind === 'steinmetz' ? { ...c, k: c.k * k } : { ...c, lossWPerM3: c.lossWPerM3 * k };
      return withParts(d, { inductor: { ...d.parts.inductor, coreLoss } });
    }),
    scaled('windingDcr', 'Winding DCR ×', (d, k) => withParts(d, { inductor: { ...d.parts.inductor, dcr20Ohm: d.parts.inductor.dcr20Ohm * k } })),
    {
      name: 'quiescent',
      label: 'Controller quiescent current',
      unit: 'A',
      initial: design.parts.controller.quiescentA,
      lower: 0,
      upper: QUIESCENT_MAX_A,
      typical: Math.max(design.parts.controller.quiescentA, 1e-3),
      apply: (d, a) => withParts(d, { controller: { ...d.parts.controller, quiescentA: a } }),
    },
  );
  const roles: Role[] = ['switch', 'rectifier', 'inductor', 'inputCapacitor', 'outputCapacitor', 'senseResistor', 'controller'];
  for (const role of roles) {
    const p = thermalParameter(design, role);
    if (p) out.push(p);
  }
  return out;
}

/**
 * The default selection (issue 12): RDS(on) of each MOSFET, the switch's gate charges, core loss, the
 * controller's quiescent current, and the thermal resistance of each part with a measured temperature.
 */
export function defaultFitParameters(design: Design, measuredRoles: readonly Role[]): FitParameterName[] {
  const names: FitParameterName[] = ['switchRdsOn'];
  if (design.parts.rectifier.kind === 'mosfet') names.push('rectifierRdsOn');
  names.push('switchCharge', 'coreLoss', 'quiescent');
  for (const role of measuredRoles) names.push(`thermal.${role}`);
  return names;
}

/** The design with every named parameter at its value. */
export function applyParameters(design: Design, params: readonly FitParameter[], values: readonly number[]): Design {
  return params.reduce((d, p, i) => p.apply(d, values[i]), design);
}
