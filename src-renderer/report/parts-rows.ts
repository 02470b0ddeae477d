/**
 * The parts list of the report: role, part name and identifier, and the few datasheet values a reviewer
 * checks first. Read from the design document and formatted; no computation.
 */
import type { Design, Role } from '../../shared-model/index.ts';
import { formatAmps, formatHertz, formatEngineering, formatVolts, roleLabel } from '../../shared-model/index.ts';

export interface PartRow {
  role: Role;
  label: string;
  name: string;
  id: string;
  invented: boolean;
  key: string;
}

export function partRows(d: Design): PartRow[] {
  const p = d.parts;
  const rows: PartRow[] = [];
  const add = (role: Role, part: { id: string; name: string; invented?: boolean }, key: string) =>
    rows.push({ role, label: roleLabel(role), name: part.name, id: part.id, invented: part.invented === true, key });
  add('switch', p.switch, `${formatVolts(p.switch.vdsRatingV)}, RDS(on) ${formatEngineering(p.switch.rdsOn25Ohm, 'Ω', 3, 'table')} at 25 °C, Qg ${formatEngineering(p.switch.qgC, 'C', 3, 'table')}`);
  const r = p.rectifier;
  add(
    'rectifier',
    r,
    r.kind === 'mosfet'
      ? `${formatVolts(r.vdsRatingV)}, RDS(on) ${formatEngineering(r.rdsOn25Ohm, 'Ω', 3, 'table')} at 25 °C`
      : `${r.technology === 'schottky' ? 'Schottky' : 'PN'}, ${formatVolts(r.vrRatingV)}, ${formatAmps(r.ifRatingA)}, Vf0 ${formatVolts(r.vf0V)}`,
  );
  add('inductor', p.inductor, `${formatEngineering(p.inductor.inductanceH, 'H', 3, 'table')}, DCR ${formatEngineering(p.inductor.dcr20Ohm, 'Ω', 3, 'table')} at 20 °C, Isat ${formatAmps(p.inductor.isatA)}`);
  for (const role of ['inputCapacitor', 'outputCapacitor'] as const) {
    const bank = p[role];
    add(role, bank.part, `${bank.count} × ${formatEngineering(bank.part.capacitanceF, 'F', 3, 'table')} ${bank.part.dielectric}, ${formatVolts(bank.part.voltageRatingV)}`);
  }
  if (p.senseResistor) add('senseResistor', p.senseResistor, `${formatEngineering(p.senseResistor.resistanceOhm, 'Ω', 3, 'table')}, ${formatEngineering(p.senseResistor.powerRatingW, 'W', 3, 'table')}`);
  add('controller', p.controller, `drive ${formatVolts(p.controller.driveV)}${p.controller.driveFromVinLinear ? ' from Vin (linear)' : ''}; fs ${formatHertz(d.spec.switchingFrequencyHz)}`);
  return rows;
}
