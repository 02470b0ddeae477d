/**
 * The warnings of the pulse-skipping state (pulse-skipping.ts), for an evaluation's record: an info note
 * while pulses skip (the pulse rate, the peak, the sleep share), a model-limit caution where pulse skipping
 * was asked for but cannot apply. Formatted only when there is something to say (once per swept point).
 */
import type { Warning } from '../warnings.ts';
import type { PulseSkipping } from './pulse-skipping.ts';

const f4 = (x: number) => Number(x.toPrecision(4)).toString();

export function pulseSkippingNotes(state: PulseSkipping | null, out: Warning[]): void {
  if (!state) return;
  if (state.note) {
    out.push({ code: 'model-limit', severity: 'caution', path: 'topology.pulseSkipping.minPeakCurrentA', message: state.note });
    return;
  }
  if (!state.active) return;
  out.push({
    code: 'pulse-skipping', severity: 'info', path: 'topology.lightLoad',
    message: `Pulse skipping (PFM): pulses of ${f4(state.minPeakA)} A peak at ${f4(state.pulseRateHz)} Hz (the equivalent switching frequency), below the mode-change load ${f4(state.modeChangeLoadA ?? 0)} A; the controller sleeps ${f4((1 - state.awakeFraction) * 100)} % of the time.`,
  });
}
