/**
 * The ledger's own warnings: thermal runaway naming the part, and model-limit notes (estimated Qgs2,
 * DCM idle-interval ringing, Coss scaled away from its stated voltage, a Qrr test current assumed equal
 * to the rated load current).
 */
import type { Warning } from '../warnings.ts';
import type { ElectroThermalSolution } from '../thermal/fixed-point.ts';
import { RUNAWAY_BAND_K } from '../thermal/fixed-point.ts';
import type { DesignNetwork } from '../thermal/from-design.ts';
import type { LedgerContext } from './kernel.ts';

const f3 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : String(x));

export function runawayWarning(net: DesignNetwork, sol: ElectroThermalSolution): Warning {
  const node = net.nodes[sol.runawayNode]!;
  const why =
    sol.runawayReason === 'loop-gain'
      ? `its electro-thermal loop gain reached ${f3(sol.loopGain[sol.runawayNode]!)} (≥ 1: each kelvin of heating adds more than a kelvin)`
      : sol.runawayReason === 'ceiling'
        ? `its temperature kept rising past ${f3(node.limitC + RUNAWAY_BAND_K)} °C (limit + ${RUNAWAY_BAND_K} K) without a fixed point`
        : 'the electro-thermal iteration diverged';
  return {
    code: 'thermal-runaway', severity: 'danger', part: node.role, path: `thermal.paths.${node.role}`,
    message:
      `Thermal runaway: the ${node.role} (${node.partName}) has no steady temperature at this point — ${why}. ` +
      `The numbers shown describe no steady state: the losses are taken with the ${node.role} at its limit + ${RUNAWAY_BAND_K} K ` +
      `and the other parts at the last iterate, and every temperature is capped at its part's limit + ${RUNAWAY_BAND_K} K. ` +
      'Estimate only: measure on hardware.',
  };
}

/** Appends the model-limit notes of the context's last point to `out`. */
export function modelNotes(ctx: LedgerContext, out: Warning[]): void {
  const op = ctx.op!;
  const sw = ctx.design.parts.switch;
  if (ctx.qgs2.source !== 'datasheet') {
    out.push({
      code: 'model-limit', severity: 'info', part: 'switch', path: 'parts.switch.qgs2C',
      message:
        ctx.qgs2.source === 'from Qgs'
          ? `Qgs2 is estimated as Qgs·(Vpl − Vth)/Vpl = ${f3(ctx.qgs2.qgs2C)} C (linear Cgs up to the plateau); give Qgs2 for better overlap losses.`
          : `Qgs2 is estimated from Qg and Qgd (${f3(ctx.qgs2.qgs2C)} C); give Qgs2 or Qgs for better overlap losses.`,
    });
  }
  if (!(sw.plateauV < ctx.design.parts.controller.driveV)) {
    out.push({
      code: 'model-limit', severity: 'danger', part: 'switch', path: 'parts.controller.driveV',
      message: 'The drive voltage does not exceed the switch\'s plateau voltage: the switch cannot turn on fully; overlap losses are capped at half a period and are not meaningful.',
    });
  }
  const rr = ctx.slots.swRecovery;
  const rect = ctx.design.parts.rectifier;
  const testStated = rect.kind === 'mosfet' ? rect.bodyDiodeQrrTestA !== undefined : rect.qrrTestA !== undefined;
  if (rr && rr.watts > 0 && !testStated) {
    const key = rect.kind === 'mosfet' ? 'bodyDiodeQrrTestA' : 'qrrTestA';
    out.push({
      code: 'model-limit', severity: 'info', part: 'rectifier', path: `parts.rectifier.${key}`,
      message:
        `The rectifier's Qrr has no stated test current: it is assumed to be stated at the rated load current ${f3(rr.inputs.testA)} A ` +
        `and scaled linearly with the diode's forward current at the switch's turn-on (${f3(rr.inputs.forwardA)} A here); ` +
        `give ${key} from the datasheet for a better reverse-recovery loss.`,
    });
  }
  if (op.mode === 'DCM') {
    out.push({
      code: 'model-limit', severity: 'info',
      message: 'DCM: the ringing of the switch node during the idle interval is not modelled; the capacitive turn-on loss uses the full swing from the start of the idle interval (conservative: the ringing usually lowers it), and no relaxation core loss is added.',
    });
  }
}
