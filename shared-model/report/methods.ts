/**
 * "Method and assumptions": the catalogue of every model the engine uses, each with its formula in
 * plain text, its published source and its known limits, in the report's words. The entries restate
 * the headers of the model files (shared-model/losses, operating-point, thermal, hazards, landmarks,
 * sweep, tolerance); `methodsFor` picks the entries that apply to one report (the loss mechanisms that
 * occur anywhere in its sweep, the checks it shows, the appendices it has).
 */
import type { Mechanism } from '../ledger/types.ts';
import type { MethodEntry } from './types.ts';
import type { LoadKind } from '../operating-point/load.ts';

const EM = 'Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed.';
const MUR = 'Mohan, Undeland & Robbins, Power Electronics';

export const METHOD_CATALOGUE: readonly MethodEntry[] = [
  {
    id: 'operating-point',
    title: 'Operating point (CCM and DCM)',
    formula:
      'Duty cycle solved so that Vin · Iin = Pout + Σ losses (self-consistent with the loss ledger). CCM ripple ΔI = V_off · (1 − D) · T / L; ' +
      'DCM from the charge balance of the triangular current with an idle interval. RMS of each straight-line current piece of fraction d: ' +
      '√(d · (I² + ΔI²/12)); capacitor currents are the exact AC parts of the branch currents.',
    source: `${EM}, ch. 2, 3 and 5 (from memory for chapter numbers); WattLedger methods §1–3.`,
    limits: [
      'Steady state only: no control-loop dynamics, start-up or load transients.',
      'Switching edges are instantaneous in the current waveforms (transition times do not enter the RMS currents).',
      'Capacitor ESL is ignored in the output ripple.',
      'Currents are straight lines within each interval: the loop resistances bend them (curvature index η = (R_on·t_on + R_off·t_off)/L · ΔI / I_L,rms); past η = 0.025 a warning gives the likely error, about 0.2·η (measured against an exact time-domain simulation).',
      'With an L(I) curve from the datasheet, ripple and peak follow Faraday\'s law λ(peak) − λ(valley) = v · t with λ = ∫L di; each interval is drawn as one straight segment between those end points (its curvature is not drawn, so the RMS is that of the chord).',
    ],
  },
  {
    id: 'load-constant-current',
    title: 'The load: a constant current',
    formula:
      'The load draws Io whatever the output ripple: the output capacitor bank carries all of the ripple of the current fed into the ' +
      'output node (buck: the inductor current; boost: the rectifier current), I_C = i_node − Io.',
    source: 'Kirchhoff\'s current law at the output node; WattLedger methods §22.',
    limits: ['An electronic load in constant-current mode, for example; a resistor, or a constant-power load such as a regulated downstream converter, shares the ripple differently (the design field "The load is").'],
  },
  {
    id: 'load-resistive',
    title: 'The load: a resistor R = Vo/Io at each load',
    formula:
      'The node ripple divides between the bank\'s ESR and the load (the bank an AC short over a period): I_C = k · (i_node − Io), ' +
      'k = R/(R + ESR); the load carries the rest; the node sees k · ESR. R follows the load along a sweep.',
    source: 'Current divider (Kirchhoff\'s laws); WattLedger methods §22, checked against an exact time-domain simulation.',
    limits: ['The capacitor\'s own voltage ripple drives no load current: R·C of at least 40 switching periods (a warning says when not).'],
  },
  {
    id: 'load-constant-power',
    title: 'The load: a constant power Vo·Io',
    formula:
      'Linearised about its operating point the load is a negative incremental resistance −R = −Vo/Io: I_C = k · (i_node − Io), ' +
      'k = 1/(1 − ESR/R) > 1, so the bank carries more ripple than with a current sink; the node sees k · ESR.',
    source: 'First-order expansion of i = P/v (common practice); WattLedger methods §22, checked against an exact time-domain simulation of the linearised load.',
    limits: [
      'Valid while the bank\'s share stays moderate (k ≤ 1.5, ESR ≤ R/3) and R·C is at least 40 switching periods; a warning says when not.',
      'Steady state only: a constant-power load lowers the damping of the output filter; stability is the control loop\'s task, not modelled here.',
    ],
  },
  {
    id: 'pulse-skipping',
    title: 'Pulse skipping (PFM) at light load',
    formula:
      'Below the mode-change load I = Q·fs, pulses ramp the inductor to the minimum peak current Ipk and back to zero: ' +
      't_on = L·Ipk/(V_on − R_on·Ipk/2), t_off = L·Ipk/(V_off + R_off·Ipk/2), charge to the output per pulse Q; pulse rate (equivalent ' +
      'switching frequency) f_p = Io/Q. The point is the DCM point at the period 1/f_p, so per-pulse losses scale with f_p; the controller ' +
      'draws Iq while a pulse runs and its sleep current between pulses; the output ripple is one pulse\'s charge on the bank plus its ESR step.',
    source: 'WattLedger methods §14 (the packet picture is common practice; the working is ours), checked against an exact time-domain simulation.',
    limits: [
      'One pulse per packet, evenly spaced; a controller that bursts several pulses per packet makes a proportionally larger ripple.',
      'The losses that take no volt-seconds are paid by a slightly higher peak at the rate set by the minimum peak (the same energy to first order).',
      'At no load no pulse carries current (the feedback network\'s own draw is not modelled); the AC winding loss of the short pulses uses the harmonics of the pulse period.',
    ],
  },
  {
    id: 'conduction',
    title: 'MOSFET conduction',
    formula: 'P = Irms² · RDS(on)(Tj), with RDS(on)(T) = R25 · (1 + α · (T − 25 °C)) or R(T0) · (T/T0)^k in kelvin.',
    source: `${EM}, ch. 3–4 (from memory for chapters); WattLedger methods §5 (temperature laws, common practice).`,
    limits: ['RDS(on) does not depend on drain current or on the gate voltage beyond the datasheet value.'],
  },
  {
    id: 'overlap',
    title: 'Switching overlap (gate-charge method)',
    formula:
      'Turn-on: Ig = (Vdrv − Vpl)/(R_pull-up + Rg), t = (Qgs2 + Qgd)/Ig, E_on = ½ · Vsw · I_on · t. ' +
      'Turn-off: Ig = Vpl/(R_pull-down + Rg), E_off = ½ · Vsw · I_off · (Qgd + Qgs2)/Ig. P = (E_on + E_off) · fs.',
    source: `${EM}, ch. 4; ${MUR}, ch. 22 (from memory for chapters); WattLedger methods §4.`,
    limits: [
      'Common-source inductance, ringing, non-linear Crss and the shift of the plateau with current are not modelled.',
      'A synchronous rectifier is taken to switch at zero voltage (no overlap loss).',
      'In DCM the ringing of the switch node during the idle interval is not modelled.',
    ],
  },
  {
    id: 'output-capacitance',
    title: 'Output capacitance (Coss)',
    formula:
      'Per cycle at swing V: E = Eoss,ctrl(V) + V · Qoss,sync(V) − Eoss,sync(V) with a synchronous FET (hard-switched half-bridge), ' +
      'E = Eoss,ctrl(V) without; P = E · fs (½ · (C1 + C2) · V² for linear capacitance).',
    source: `WattLedger methods §4; ${EM}, ch. 4 (from memory).`,
    limits: ['Charge and energy are scaled from the datasheet voltage with constant equivalent capacitances; far below that voltage a strongly non-linear Coss holds more charge.'],
  },
  {
    id: 'gate-drive',
    title: 'Gate drive',
    formula:
      'Driver energy Qg · Vdrv · fs, the share Rg/(Rg + R_driver) burnt inside the FET, the rest in the controller; ' +
      'when the drive rail is made from Vin by a linear regulator the input pays Vin · Qg · fs.',
    source: `WattLedger methods §4; ${EM}, ch. 4 (from memory).`,
    limits: ['Qg is taken at the drive voltage from the datasheet; the gate capacitance is treated as linear for the charge/discharge split.'],
  },
  {
    id: 'dead-time',
    title: 'Dead-time body-diode conduction',
    formula: 'P = VSD · (I1 · t1 + I2 · t2) · fs, with the inductor current held constant over each dead time.',
    source: `WattLedger methods §4; ${EM}, ch. 4 (from memory).`,
    limits: ['VSD is constant (no dependence on current or temperature); the channel loss over the same interval is not subtracted (slight overestimate).'],
  },
  {
    id: 'reverse-recovery',
    title: 'Reverse recovery',
    formula:
      'P ≈ Qrr · (IF / Itest) · Vsw · fs, charged to the control switch that turns on into the conducting diode: the datasheet Qrr, ' +
      'stated at the test current Itest, is scaled linearly to the forward current IF the diode carries when the switch turns on ' +
      '(0 in DCM, so the loss is continuous at the CCM/DCM boundary). Itest is the rated load current when the part does not state it.',
    source: `WattLedger methods §4; ${MUR}, ch. 20–22, charge-control model of the diode Q ≈ τ · IF (from memory).`,
    limits: [
      'Linear in the forward current (a simplification: measured Qrr grows less than linearly at high current); its dependence on di/dt and temperature is not modelled.',
      'Where the part states no Qrr test current, the rated load current is assumed (a model-limit note says so).',
    ],
  },
  {
    id: 'diode-forward',
    title: 'Diode forward conduction',
    formula:
      'P = Vf0(Tj) · Iavg + Rd · Irms², Vf0(Tj) = Vf0 + (dVf0/dT) · (Tj − 25 °C); with the datasheet\'s VF(IF, Tj) curves, ' +
      'P = (1/Ts) · ∫ VF(i, Tj) · i dt over the rectifier current, exact over straight lines between the points and between the curves\' temperatures.',
    source: `WattLedger methods §6; ${EM}, ch. 3 (from memory).`,
    limits: [
      'The straight-line forward model holds over the current range; Rd does not change with temperature.',
      'Curves: beyond a curve\'s last point VF follows its last segment, outside the curves\' temperatures the nearest curve is used (a warning says so); the duty solver sees the curve\'s tangent at the rated load current.',
    ],
  },
  {
    id: 'junction-capacitance',
    title: 'Schottky junction capacitance',
    formula: 'P = ½ · Cj · V² · fs (linear Cj), heat booked to the control switch.',
    source: 'WattLedger methods §6.',
    limits: ['Cj is taken as constant with voltage.'],
  },
  {
    id: 'reverse-leakage',
    title: 'Diode reverse leakage',
    formula: 'P = IR(Tj) · VR · (fraction of the period blocking), IR(T) = IR(T0) · 2^((T − T0)/Td), Td ≈ 10 K.',
    source: 'WattLedger methods §6 (common practice).',
    limits: ['Leakage does not depend on the reverse voltage; ringing in the DCM idle interval is ignored.'],
  },
  {
    id: 'winding-dc',
    title: 'Inductor winding, DC resistance',
    formula: 'P = IL,rms² · DCR(T), DCR(T) = DCR20 · (1 + 0.00393/K · (T − 20 °C)).',
    source: 'IEC 60028 copper (α20 from memory); WattLedger methods §8.',
    limits: ['The winding is taken to be uniformly at the hot-spot temperature (slightly conservative).'],
  },
  {
    id: 'winding-ac',
    title: 'Inductor winding, AC excess',
    formula: 'P = Iac,rms² · DCR(T) · (F_R − 1), F_R a user factor at fs or Dowell\'s layered-winding factor weighted over the ripple harmonics.',
    source: 'P. L. Dowell, Proc. IEE 113(8), 1966; WattLedger methods §8.',
    limits: ['Dowell assumes a one-dimensional field in full-width layers; fringing near gaps is not modelled.'],
  },
  {
    id: 'core',
    title: 'Inductor core (iGSE)',
    formula:
      'Pv = (1/T) · Σ ki · |ΔB_s/t_s|^α · ΔB^(β−α) · t_s over the straight flux segments, ki = k/((2π)^(α−1) · 2^(β−α) · ∫|cos θ|^α dθ); P = Pv · Ve.',
    source: 'Venkatachalam, Sullivan, Abdallah & Tacca, COMPEL 2002, DOI 10.1109/CIPE.2002.1196712; WattLedger methods §7; the temperature curve §26.',
    limits: ['Steinmetz exponents at one temperature (a core-loss-vs-temperature curve, when given, multiplies the loss at the inductor temperature); no DC-bias dependence; no relaxation loss after the DCM idle interval.'],
  },
  {
    id: 'esr',
    title: 'Capacitor ESR',
    formula: 'P = ESR(T) · Irms² / n for n equal capacitors sharing the bank current; with an ESR(f) table ESR = Σ Ih²·ESR(h·fs) / Irms² over the harmonics of the bank current.',
    source: 'WattLedger methods §9, §1 (common practice) and §26 (harmonics).',
    limits: ['Without an ESR(f) table the ESR at the switching frequency applies to the whole ripple spectrum; ESR(f, T) = ESR(f)·ratio(T); the capacitors share the current equally.'],
  },
  {
    id: 'sense',
    title: 'Current-sense resistor',
    formula: 'P = Irms² · R · (1 + TCR · (T − 25 °C)) with the RMS current of the resistor\'s branch.',
    source: 'Common practice (Joule heating with the datasheet TCR).',
    limits: [],
  },
  {
    id: 'quiescent',
    title: 'Controller quiescent current',
    formula: 'P = Vin · Iq.',
    source: 'Common practice (datasheet quiescent current).',
    limits: ['Iq is constant over load and input voltage.'],
  },
  {
    id: 'thermal-network',
    title: 'Thermal network',
    formula:
      'Direct: Tj = Ta + P · θJA (a stated rise gives θ = rise / dissipation). Heatsink: Ts = Ta + θSA · ΣPi, Tj,i = Ts + Pi · (θJC,i + θCS,i). ' +
      'Touchable surface: the heatsink, or the case top Tj − ψJT · P where ψJT is given, else the junction itself.',
    source: 'JEDEC JESD51 definitions; WattLedger methods §10.',
    limits: [
      'Linear and steady state; parts couple only through a shared heatsink.',
      'JESD51 θJA describes a standard test board; the value entered is taken as describing this board.',
    ],
  },
  {
    id: 'electro-thermal',
    title: 'Electro-thermal solution',
    formula:
      'All part temperatures solved at once from T = Ta + Θ · P(T) (Newton iteration). Runaway when the loop gain θ · dP/dT reaches 1, ' +
      'when no fixed point lies below the part\'s limit + 100 K, or when the iteration diverges; such a point is reported as not converged.',
    source: 'WattLedger methods §10.',
    limits: ['A point flagged as runaway has no steady state: its numbers are the last iterate and describe nothing real.'],
  },
  {
    id: 'ratings',
    title: 'Rating checks and saturation',
    formula:
      'Temperature ≤ limit − margin; blocking voltage ≤ rating · derating; capacitor RMS current per part ≤ rating · derating; ' +
      'inductor peak |current| ≤ Isat(T) = Isat · (1 + c · (T − T_isat)); resistor power ≤ derated rating · derating.',
    source: 'Common practice (datasheet ratings and derating curves).',
    limits: ['Saturation is a single threshold: the gradual fall of inductance before Isat is only modelled where a roll-off point is given.'],
  },
  {
    id: 'capacitor-life',
    title: 'Electrolytic capacitor life',
    formula: 'L = L0 · 2^((T0 − T)/10 K) at the hot-spot temperature.',
    source: 'Common practice ("10 K rule"); WattLedger methods §9.',
    limits: ['A rule of thumb: the maker\'s own life formula and ripple multipliers take precedence.'],
  },
  {
    id: 'burn-hazard',
    title: 'Burn-hazard check',
    formula:
      'Each touchable surface temperature against the strictest row of the touch-limit table that fits its material and the contact assumption; margin = limit − surface temperature.',
    source: 'IEC 62368-1 Table 38; ISO 13732-1:2006; IEC 60950-1 Table 4C (withdrawn). Rows marked "recalled" were not confirmed against the printed standard (WattLedger methods §11).',
    limits: ['Touch limits depend on the edition and the product standard that applies: confirm every row used against the current edition.'],
  },
  {
    id: 'landmarks',
    title: 'Load sweep and landmarks',
    formula:
      'Every sweep point fully electro-thermal. Peak: the highest efficiency, refined between sweep points. Knee: see its definition in the summary. ' +
      'Thermal ceiling: the lightest load at which any part reaches its derated temperature limit or a touch limit.',
    source: 'WattLedger definitions (no standard defines a light-load knee); WattLedger methods §12.',
    limits: ['Landmarks are found between sweep points: a feature narrower than the point spacing can be missed.'],
  },
  {
    id: 'figures-of-merit',
    title: 'Average and light-load efficiency',
    formula: 'Average of the efficiencies at 25, 50, 75 and 100 % of rated load; efficiency at 10 % of rated load.',
    source: 'US 10 CFR 430 Subpart B, Appendix Z (average); EU Regulation 2019/1782 (10 % point).',
    limits: ['Those rules are written for external power supplies; here they are a yardstick, not a compliance test.'],
  },
  {
    id: 'comparison',
    title: 'Part comparison',
    formula: 'The same design evaluated with each alternative part in one role; the winner at each load is the lowest total loss; crossovers refined between sweep points.',
    source: 'WattLedger method.',
    limits: ['Only the part changes: layout, thermal path and drive are kept as designed.'],
  },
  {
    id: 'tolerance',
    title: 'Tolerance analysis',
    formula:
      'Worst case: every combination of the extreme of each tolerance (full factorial). Monte Carlo: samples drawn with a stated seed (MT19937), ' +
      'quantiles by Hyndman & Fan type 7.',
    source: 'Hyndman & Fan, The American Statistician 50(4), 1996; Matsumoto & Nishimura, ACM TOMACS 8(1), 1998 (from memory for the volume).',
    limits: ['Corners bound a result only where it changes monotonically with each tolerance; default spreads are common practice, not datasheet values.'],
  },
  {
    id: 'design-checks',
    title: 'Sizing and design checks',
    formula:
      'The design evaluated at rated load at Vin min, nominal and max (and, for a boost, Vin = Vout/2); from those solved points the inductance for ' +
      'the ripple target, the output capacitance and ESR for the ripple target, the ratings after derating, the duty range, the compensating ramp ' +
      'm2/2 and the crossover limit min(fs/10, fz/5). Each check holds a value at its worst regulated corner against its limit: pass, warn ' +
      '(between the derated and the full rating, or guidance) or fail.',
    source: `${EM}, ch. 2, 3 and 8 (from memory for chapter numbers); Ridley, IEEE Trans. Power Electronics 6(2), 1991 (from memory); WattLedger methods §23, §24.`,
    limits: [
      'Corners at rated load only; light-load and transient stresses are not checked.',
      'ESL, ringing and voltage spikes are not modelled: measure them.',
      'Slope compensation and crossover are guidance for a loop design, not a loop design; the controller\'s own ramp is not known.',
      'Derating rules (80 % current, 20–40 % ripple, fs/10, fz/5) are common practice, not standards.',
    ],
  },
];

const BY_MECHANISM: Readonly<Record<Mechanism, string>> = {
  conduction: 'conduction',
  'turn-on overlap': 'overlap',
  'turn-off overlap': 'overlap',
  'output capacitance': 'output-capacitance',
  'gate drive': 'gate-drive',
  'dead-time diode': 'dead-time',
  'reverse recovery': 'reverse-recovery',
  'forward drop': 'diode-forward',
  'junction capacitance': 'junction-capacitance',
  'reverse leakage': 'reverse-leakage',
  'winding DC': 'winding-dc',
  'winding AC': 'winding-ac',
  core: 'core',
  ESR: 'esr',
  sense: 'sense',
  quiescent: 'quiescent',
};

export interface MethodSelection {
  mechanisms: Iterable<Mechanism>;
  /** What the load is (the design's spec.loadKind, absent: constant current): picks its load-model entry. */
  loadKind: LoadKind;
  /** The design skips pulses at light load (topology.lightLoad "pulse-skipping"). */
  pulseSkipping?: boolean;
  capacitorLife: boolean;
  comparison: boolean;
  tolerance: boolean;
}

/** The catalogue entries that apply, in catalogue order. */
export function methodsFor(selection: MethodSelection): MethodEntry[] {
  const wanted = new Set<string>(['operating-point', `load-${selection.loadKind}`, 'thermal-network', 'electro-thermal', 'ratings', 'burn-hazard', 'landmarks', 'figures-of-merit']);
  for (const m of selection.mechanisms) wanted.add(BY_MECHANISM[m]);
  if (selection.capacitorLife) wanted.add('capacitor-life');
  if (selection.pulseSkipping) wanted.add('pulse-skipping');
  if (selection.comparison) wanted.add('comparison');
  if (selection.tolerance) wanted.add('tolerance');
  return METHOD_CATALOGUE.filter((entry) => wanted.has(entry.id));
}
