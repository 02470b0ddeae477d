/**
 * Student's t distribution: the two-sided quantile used for confidence intervals of fitted parameters.
 *
 * CDF: for t ≥ 0, P(T ≤ t) = 1 − ½·I_x(ν/2, ½) with x = ν/(ν + t²), where I_x(a, b) is the regularized
 * incomplete beta function (Abramowitz & Stegun 26.7.1 and 26.5.1 [memory for equation numbers]),
 * evaluated by its continued fraction with the modified Lentz method (Press et al., Numerical Recipes,
 * 3rd ed., §6.4 [memory]). The quantile is found by bisection on the CDF to 1e-12 (the CDF is monotone).
 * Domain: ν ≥ 1 (whole or fractional), 0 < p < 1.
 */

function lnGamma(z: number): number {
  // Lanczos approximation, g = 7, n = 9 (coefficients as published by Godfrey; common practice).
  const c = [
    0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
    12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
  ];
  if (z < 0.5) return Math.log(Math.PI / Math.abs(Math.sin(Math.PI * z))) - lnGamma(1 - z);
  const x = z - 1;
  let a = c[0];
  const t = x + 7.5;
  for (let i = 1; i < 9; i++) a += c[i] / (x + i);
  return 0.5 * Math.log(2 * Math.PI) + (x + 0.5) * Math.log(t) - t + Math.log(a);
}

function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 500; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) break;
  }
  return h;
}

/** The regularized incomplete beta function I_x(a, b), 0 ≤ x ≤ 1, a, b > 0. */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(lnGamma(a + b) - lnGamma(a) - lnGamma(b) + a * Math.log(x) + b * Math.log(1 - x));
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/** P(T ≤ t) for Student's t with ν degrees of freedom. */
export function studentTCdf(t: number, dof: number): number {
  const tail = 0.5 * incompleteBeta(dof / (dof + t * t), dof / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** The t with P(T ≤ t) = p for ν degrees of freedom (e.g. p = 0.975 for a two-sided 95 % interval). */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p > 0 && p < 1) || !(dof >= 1)) throw new RangeError(`studentTQuantile needs 0 < p < 1 and dof ≥ 1 (got p ${p}, dof ${dof})`);
  if (p < 0.5) return -studentTQuantile(1 - p, dof);
  let lo = 0;
  let hi = 1;
  while (studentTCdf(hi, dof) < p) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * Math.max(1, hi); i++) {
    const mid = 0.5 * (lo + hi);
    if (studentTCdf(mid, dof) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
