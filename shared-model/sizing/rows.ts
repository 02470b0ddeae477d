/**
 * The sizing as labelled rows, in the order people read it (duty, inductor, output bank, input bank,
 * stresses, slope, loop): one list shared by the command line, the results screen and the report, so the
 * three never disagree on what is shown. A row without a value was not sized (its reason is in the notes).
 */
import type { SizedValue, Sizing } from './types.ts';

export interface SizingRow {
  label: string;
  value?: SizedValue;
}

export function sizingRows(s: Sizing): SizingRow[] {
  const c = s.outputCapacitor;
  const rows: SizingRow[] = [
    { label: 'Duty, smallest', value: s.duty.min },
    { label: 'Duty, largest', value: s.duty.max },
    { label: 'Rated inductor current', value: s.inductor.ratedCurrentA },
    { label: 'Inductance for the ripple target', value: s.inductor.requiredInductanceH },
    { label: 'Isat needed (hot)', value: s.inductor.requiredIsatA },
    { label: 'Inductor RMS current', value: s.inductor.requiredRmsA },
    { label: 'Output charge per period', value: c.chargeC },
    { label: 'Output capacitor current swing', value: c.currentSwingA },
    { label: 'Output capacitance, zero ESR', ...(c.minCapacitanceF ? { value: c.minCapacitanceF } : {}) },
    { label: 'Largest ESR, unlimited C', ...(c.maxEsrOhm ? { value: c.maxEsrOhm } : {}) },
    { label: 'Capacitance with the bank ESR', ...(c.capacitanceWithBankEsrF ? { value: c.capacitanceWithBankEsrF } : {}) },
    { label: 'Largest ESR with the bank C', ...(c.maxEsrWithBankCapacitanceOhm ? { value: c.maxEsrWithBankCapacitanceOhm } : {}) },
    { label: 'Output capacitor RMS', value: c.rmsA },
    { label: 'Input capacitor RMS', value: s.inputCapacitorRmsA },
    { label: 'Switch voltage', value: s.stresses.switchV },
    { label: 'Switch peak current', value: s.stresses.switchPeakA },
    { label: 'Rectifier voltage', value: s.stresses.rectifierV },
    { label: 'Rectifier mean current', value: s.stresses.rectifierAverageA },
    { label: 'Inductor down-slope m2', value: s.slope.downSlopeAPerS },
  ];
  if (s.slope.senseSignalPeakV) rows.push({ label: 'Sense signal with the minimum ramp', value: s.slope.senseSignalPeakV });
  if (s.slope.senseLossW) rows.push({ label: 'Sense resistor loss', value: s.slope.senseLossW });
  rows.push({ label: 'Output pole', value: s.loop.outputPoleHz });
  if (s.loop.rhpZeroHz) rows.push({ label: 'RHP zero (lowest)', value: s.loop.rhpZeroHz });
  return rows;
}
