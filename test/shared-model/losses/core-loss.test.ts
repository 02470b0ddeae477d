import { describe, expect, it } from 'vitest';
import { coreCoefficients, cosPowerIntegral, igseKi, steinmetzKFromPoint } from '../../../shared-model/losses/steinmetz.ts';
import { coreLoss, fluxSwingT, igseLossDensity } from '../../../shared-model/losses/core-loss.ts';
import { gamma } from '../../../shared-model/losses/gamma.ts';
import type { Segment } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';

// docs/methods.md §7 material: α 1.46, β 2.75, k such that a 100 kHz, 0.1 T sine gives 300 kW/m³.
const ALPHA = 1.46;
const BETA = 2.75;
const K = steinmetzKFromPoint(300e3, 100e3, 0.1, ALPHA, BETA);

describe('gamma function (Lanczos)', () => {
  it('matches Γ(1/2) = √π, Γ(5) = 24 and Γ(3/2) = √π/2', () => {
    closeTo(gamma(0.5), Math.sqrt(Math.PI), 1e-13); // Abramowitz & Stegun 6.1.8
    closeTo(gamma(5), 24, 1e-13); // Γ(n) = (n − 1)!
    closeTo(gamma(1.5), Math.sqrt(Math.PI) / 2, 1e-13); // A&S 6.1.9 recurrence from Γ(1/2)
  });
});

describe('Steinmetz and iGSE coefficients', () => {
  it('derives k = 8.455149 from the 300 kW/m³ point', () => {
    closeTo(K, 8.455149, 1e-6); // docs/methods.md §7: k 8.455149
  });
  it('computes ∫₀^{2π}|cos θ|^α dθ = 3.529752 for α 1.46, and π for α 2', () => {
    closeTo(cosPowerIntegral(ALPHA), 3.529752, 1e-6); // docs/methods.md §7
    closeTo(cosPowerIntegral(2), Math.PI, 1e-13); // ∫cos² over a period = π (elementary)
  });
  it('computes ki 0.420616 (and 0.0570557 for α 1.5, β 2.5, k 1)', () => {
    closeTo(igseKi(K, ALPHA, BETA), 0.420616, 1e-6); // docs/methods.md §7: ki 0.420616
    closeTo(igseKi(1, 1.5, 2.5), 0.0570557, 1e-6); // docs/methods.md §7: (α 1.5, β 2.5, k 1 → ki 0.0570557)
  });
  it("derives k from a 'point' core-loss record", () => {
    const c = coreCoefficients({ kind: 'point', lossWPerM3: 300e3, atHz: 100e3, atPeakT: 0.1, alpha: ALPHA, beta: BETA });
    closeTo(c.k, 8.455149, 1e-6); // docs/methods.md §7: k 8.455149
    closeTo(c.ki, 0.420616, 1e-6); // docs/methods.md §7: ki 0.420616
  });
});

describe('iGSE on piecewise-linear flux', () => {
  const ki = igseKi(K, ALPHA, BETA);
  it('gives 276 198.9 W/m³ for a 0.2 T triangle at 100 kHz, D 0.5', () => {
    const T = 1e-5;
    const segs: Segment[] = [
      { durationS: T / 2, i0A: -0.1, i1A: 0.1 },
      { durationS: T / 2, i0A: 0.1, i1A: -0.1 },
    ];
    closeTo(igseLossDensity(ki, ALPHA, BETA, 1, segs), 276198.9, 1e-6); // docs/methods.md §7: triangle → 276 198.9 W/m³
  });
  it('returns the Steinmetz 300 kW/m³ when integrated numerically over the sine', () => {
    const T = 1e-5;
    const n = 20000;
    const segs: Segment[] = [];
    for (let k = 0; k < n; k++) {
      const b0 = 0.1 * Math.sin((2 * Math.PI * k) / n);
      const b1 = 0.1 * Math.sin((2 * Math.PI * (k + 1)) / n);
      segs.push({ durationS: T / n, i0A: b0, i1A: b1 });
    }
    closeTo(igseLossDensity(ki, ALPHA, BETA, 1, segs), 300e3, 1e-3); // docs/methods.md §7: iGSE over the sine must return 300 kW/m³ (numerical, 1e-3)
  });
  it('matches the closed form ki·ΔB^β·f^α·(D^(1−α) + D′^(1−α)) for an asymmetric triangle', () => {
    const T = 4e-6;
    const d = 0.3;
    const segs: Segment[] = [
      { durationS: d * T, i0A: 0, i1A: 0.15 },
      { durationS: (1 - d) * T, i0A: 0.15, i1A: 0 },
    ];
    const closed = ki * 0.15 ** BETA * (1 / T) ** ALPHA * (d ** (1 - ALPHA) + (1 - d) ** (1 - ALPHA)); // docs/methods.md §7 triangle formula
    closeTo(igseLossDensity(ki, ALPHA, BETA, 1, segs), closed, 1e-12);
  });
  it('adds nothing for the flat DCM idle interval (same energy per cycle over a longer period)', () => {
    const tOn = 1e-6;
    const tOff = 1e-6;
    const ccm: Segment[] = [
      { durationS: tOn, i0A: 0, i1A: 0.1 },
      { durationS: tOff, i0A: 0.1, i1A: 0 },
    ];
    const dcm: Segment[] = [...ccm, { durationS: 2e-6, i0A: 0, i1A: 0 }];
    // iGSE: the idle interval has dB/dt = 0, so the loss per cycle is unchanged and Pv halves with 2× period.
    closeTo(igseLossDensity(ki, ALPHA, BETA, 1, dcm), igseLossDensity(ki, ALPHA, BETA, 1, ccm) / 2, 1e-12); // Venkatachalam et al. 2002 (iGSE integrand ∝ |dB/dt|^α)
  });
  it('scales flux with L/(N·Ae) and loss with Ve', () => {
    const segs: Segment[] = [
      { durationS: 1e-6, i0A: 1, i1A: 2 },
      { durationS: 1e-6, i0A: 2, i1A: 1 },
    ];
    const fluxPerAmp = 10e-6 / (10 * 20e-6); // L/(N·Ae) (docs/methods.md §7: ΔB = L·ΔI/(N·Ae))
    closeTo(fluxSwingT(fluxPerAmp, segs), fluxPerAmp * 1, 1e-15);
    const w = coreLoss.watts({ kiWPerM3: ki, alpha: ALPHA, beta: BETA, veM3: 2e-6, fluxPerAmpT: fluxPerAmp, segments: segs, temperatureFactor: 1, temperatureC: 25 });
    closeTo(w, 2e-6 * igseLossDensity(ki, ALPHA, BETA, fluxPerAmp, segs), 1e-12); // P = Pv·Ve (docs/methods.md §7)
    expect(coreLoss.describe({ kiWPerM3: ki, alpha: ALPHA, beta: BETA, veM3: 2e-6, fluxPerAmpT: fluxPerAmp, segments: segs, temperatureFactor: 1, temperatureC: 25 }).map((x) => x.name)).toContain('ΔB (peak to peak)');
  });
});
