/**
 * Dead-time loss: a FET's body diode carries the inductor current while neither channel is on.
 *
 * Formula: P = VSD · (I1 · t1 + I2 · t2) · fs, with I1 the current at the first dead time (after the
 * control switch turns off, lasting t1) and I2 the current at the second (before it turns on, lasting t2).
 * The caller passes, for each interval, the current flowing in this FET's body-diode direction (positive
 * inductor current → the rectifier FET; negative current in forced PWM → the control FET's body diode), or
 * 0. Assumptions: the current is constant over each dead time; the body diode drop is VSD (datasheet),
 * independent of current and temperature; the channel's conduction over the same interval is not
 * subtracted from the rectifier's RMS loss (a small overestimate).
 * Source: docs/methods.md §4 (0.16 W check value); Erickson & Maksimović 2nd ed. ch. 4 [memory].
 */
import { input, nonNegativeFinite, type LossModel } from './model.ts';

export interface DeadTimeInputs {
  vsdV: number;
  /** Body-diode current during the dead time after the control switch turns off, A. */
  firstA: number;
  firstS: number;
  /** Body-diode current during the dead time before the control switch turns on, A. */
  secondA: number;
  secondS: number;
  frequencyHz: number;
}

export const deadTime: LossModel<DeadTimeInputs> = {
  mechanism: 'dead-time diode',
  heats: 'own',
  payer: 'path',
  thermal: false,
  drop: false,
  formula: 'VSD · (I1 · t1 + I2 · t2) · fs',
  watts: (x) =>
    nonNegativeFinite(
      x.vsdV * (nonNegativeFinite(x.firstA) * x.firstS + nonNegativeFinite(x.secondA) * x.secondS) * x.frequencyHz,
    ),
  describe: (x) => [
    input('VSD', x.vsdV, 'V'),
    input('I1', nonNegativeFinite(x.firstA), 'A'),
    input('t1', x.firstS, 's'),
    input('I2', nonNegativeFinite(x.secondA), 'A'),
    input('t2', x.secondS, 's'),
    input('fs', x.frequencyHz, 'Hz'),
  ],
};
