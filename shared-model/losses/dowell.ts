/**
 * Dowell's AC-resistance factor for layered windings, weighted over the harmonics of the ripple current.
 *
 * Skin depth δ = √(ρ/(π·f·μ0)); copper ρ(T) = ρ20·(1 + α20·(T − 20 °C)), ρ20 = 1/58 Ω·mm²/m,
 * α20 = 0.00393/K (IEC 60028 [memory for α]). Penetration ratio Δ = (h/δ)·√η for conductor thickness h
 * and layer porosity η. Dowell (Proc. IEE 113(8), 1966), m layers:
 *   F_R(Δ, m) = Δ · [ (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ) + (2(m² − 1)/3) · (sinh Δ − sin Δ)/(cosh Δ + cos Δ) ].
 * Harmonics: a continuous piecewise-linear current with slope changes Δs_k at times τ_k has Fourier
 * coefficients C_n = −Σ_k Δs_k · e^(−j·n·ω·τ_k) / (T · (n·ω)²), harmonic RMS² = 2·|C_n|² (Parseval: the
 * sum over n is the AC RMS², ΔI²/12 for a triangle). Effective factor over the first HARMONICS harmonics,
 * the remainder of the AC power taken at the last harmonic's factor:
 *   F_eff = (Σ_n F_R(Δ·√n)·I_n² + F_R(Δ·√N)·(Iac² − Σ_n I_n²)) / Iac².
 * Source: Dowell 1966; docs/methods.md §8 (δ 0.208981 mm at 100 kHz, F_R(1, 1) = 1.085636).
 */
import type { Segment } from '../operating-point/types.ts';

export const COPPER_RESISTIVITY_20C_OHM_M = 1 / 58e6;
export const COPPER_ALPHA_20_PER_K = 0.00393;
export const VACUUM_PERMEABILITY = 4e-7 * Math.PI;
/**
 * Harmonics weighted one by one. The rest of the AC power — Σ over n > 8 of 1/n⁴ against the whole sum,
 * under 0.1 % for a triangle — takes the 8th harmonic's factor.
 */
export const HARMONICS = 8;

export function copperResistivityOhmM(temperatureC: number): number {
  return COPPER_RESISTIVITY_20C_OHM_M * (1 + COPPER_ALPHA_20_PER_K * (temperatureC - 20));
}

export function skinDepthM(resistivityOhmM: number, frequencyHz: number): number {
  return Math.sqrt(resistivityOhmM / (Math.PI * frequencyHz * VACUUM_PERMEABILITY));
}

/** Dowell's Rac/Rdc for penetration ratio Δ and m layers (finite for every Δ ≥ 0). */
export function dowellFactor(delta: number, layers: number): number {
  if (!(delta > 0)) return 1;
  const proximity = (2 * (layers * layers - 1)) / 3;
  if (delta < 1e-3) return 1 + ((5 * layers * layers - 1) / 45) * delta ** 4;
  if (delta > 20) return delta * (1 + proximity);
  const e1 = Math.exp(delta);
  const e2 = e1 * e1;
  const sin1 = Math.sin(delta);
  const cos1 = Math.cos(delta);
  const sin2 = 2 * sin1 * cos1;
  const cos2 = 1 - 2 * sin1 * sin1;
  const skin = (0.5 * (e2 - 1 / e2) + sin2) / (0.5 * (e2 + 1 / e2) - cos2);
  const prox = (0.5 * (e1 - 1 / e1) - sin1) / (0.5 * (e1 + 1 / e1) + cos1);
  return delta * (skin + proximity * prox);
}

/**
 * RMS² of harmonics 1..count of a continuous piecewise-linear periodic current, written into
 * out[0..count − 1] (out[n − 1] for harmonic n). `out` must hold at least 2·count numbers: it is also the
 * scratch space for the complex sums. Returns the period (0 for an empty waveform).
 */
export function harmonicPowers(segments: readonly Segment[], count: number, out: Float64Array): number {
  let period = 0;
  for (const s of segments) if (s.durationS > 0) period += s.durationS;
  out.fill(0, 0, 2 * count);
  if (!(period > 0)) return 0;
  const omega = (2 * Math.PI) / period;
  let prevSlope = 0;
  for (let i = segments.length - 1; i >= 0; i--) {
    const s = segments[i]!;
    if (s.durationS > 0) {
      prevSlope = (s.i1A - s.i0A) / s.durationS;
      break;
    }
  }
  let tau = 0;
  for (const s of segments) {
    if (!(s.durationS > 0)) continue;
    const slope = (s.i1A - s.i0A) / s.durationS;
    const jump = slope - prevSlope;
    prevSlope = slope;
    if (jump !== 0) {
      // Add −jump·e^(−j·n·ω·τ) for n = 1..count by repeated rotation (one cos/sin per corner).
      const c1 = Math.cos(omega * tau);
      const s1 = -Math.sin(omega * tau);
      let re = 1;
      let im = 0;
      for (let n = 0; n < count; n++) {
        const r = re * c1 - im * s1;
        im = re * s1 + im * c1;
        re = r;
        out[2 * n] = out[2 * n]! - jump * re;
        out[2 * n + 1] = out[2 * n + 1]! - jump * im;
      }
    }
    tau += s.durationS;
  }
  // In place: harmonic n reads slots 2(n−1), 2(n−1)+1 and writes slot n−1 (never read again).
  for (let n = 1; n <= count; n++) {
    const w = period * (n * omega) * (n * omega);
    const re = out[2 * (n - 1)]! / w;
    const im = out[2 * (n - 1) + 1]! / w;
    out[n - 1] = 2 * (re * re + im * im);
  }
  return period;
}

/** Scratch length dowellRippleFactor needs: harmonic work space, per-harmonic factors and their key. */
export const DOWELL_SCRATCH = 3 * HARMONICS + 2;

/**
 * Effective Rac/Rdc of a layered winding for this ripple waveform (see header), at the winding
 * temperature. `scratch` (DOWELL_SCRATCH numbers) also keeps the per-harmonic factors of the last
 * penetration ratio, so repeated calls at one temperature skip them.
 */
export function dowellRippleFactor(
  segments: readonly Segment[],
  acRmsA: number,
  layers: number,
  conductorThicknessM: number,
  porosity: number,
  temperatureC: number,
  scratch: Float64Array,
): number {
  const total = acRmsA * acRmsA;
  const period = harmonicPowers(segments, HARMONICS, scratch);
  if (!(total > 0) || !(period > 0)) return 1;
  const rho = copperResistivityOhmM(temperatureC);
  const delta1 = (conductorThicknessM * Math.sqrt(porosity)) / skinDepthM(rho, 1 / period);
  if (!Number.isFinite(delta1)) return 1;
  const factors = 2 * HARMONICS;
  const key = 3 * HARMONICS;
  if (scratch[key] !== delta1 || scratch[key + 1] !== layers) {
    for (let n = 1; n <= HARMONICS; n++) scratch[factors + n - 1] = dowellFactor(delta1 * Math.sqrt(n), layers);
    scratch[key] = delta1;
    scratch[key + 1] = layers;
  }
  let weighted = 0;
  let captured = 0;
  let last = 1;
  for (let n = 1; n <= HARMONICS; n++) {
    last = scratch[factors + n - 1]!;
    weighted += last * scratch[n - 1]!;
    captured += scratch[n - 1]!;
  }
  const rest = total > captured ? total - captured : 0;
  const f = (weighted + last * rest) / total;
  return Number.isFinite(f) && f > 0 ? f : 1;
}
