import { describe, expect, it } from 'vitest';
import { ConvergenceError } from './errors.js';
import {
  brentRoot,
  gaussIntegrate,
  gaussKronrod15,
  gaussLegendre,
  goldenMaximum,
  integrate,
  integratePair,
} from './quadrature.js';

describe('Gauss–Legendre', () => {
  it('integrates polynomials of degree 2n − 1 exactly (Abramowitz & Stegun 25.4.29)', () => {
    for (const n of [8, 16, 32, 64]) {
      const { weights } = gaussLegendre(n);
      expect(weights.reduce((s, w) => s + w, 0)).toBeCloseTo(2, 13);
      // ∫₀¹ x^(2n−1) dx = 1/(2n)
      expect(gaussIntegrate((x) => x ** (2 * n - 1), 0, 1, n)).toBeCloseTo(1 / (2 * n), 13);
    }
  });
});

describe('Gauss–Kronrod 7/15', () => {
  it('K15 is exact to degree 22 and G7 to degree 13 (Piessens et al., QUADPACK 1983)', () => {
    // ∫₋₁¹ x^22 dx = 2/23
    expect(gaussKronrod15((x) => x ** 22, -1, 1).value).toBeCloseTo(2 / 23, 14);
    expect(gaussKronrod15((x) => x ** 12, -1, 1).error).toBeLessThan(1e-15);
  });

  it('adaptive integration of textbook integrals', () => {
    expect(integrate(Math.sin, 0, Math.PI)).toBeCloseTo(2, 12);
    // ∫₀¹ dx/sqrt(x) = 2 (endpoint singularity, needs bisection)
    expect(
      integrate((x) => 1 / Math.sqrt(x), 0, 1, { relTolerance: 1e-9, maxPanels: 5000 }),
    ).toBeCloseTo(2, 7);
    const [a, b] = integratePair(
      (x, out) => {
        out[0] = Math.exp(x);
        out[1] = x * x;
      },
      0,
      1,
    );
    expect(a).toBeCloseTo(Math.E - 1, 13);
    expect(b).toBeCloseTo(1 / 3, 14);
  });

  it('throws ConvergenceError on a non-integrable integrand', () => {
    expect(() => integrate((x) => 1 / x, 0, 1, { maxPanels: 50 })).toThrow(ConvergenceError);
  });
});

describe('Brent root', () => {
  it('finds the Dottie number cos x = x (0.7390851332151607, value from memory, checked by the residual)', () => {
    const root = brentRoot((x) => Math.cos(x) - x, 0, 1) as number;
    expect(Math.abs(Math.cos(root) - root)).toBeLessThan(1e-15);
    expect(root).toBeCloseTo(0.7390851332151607, 15);
  });

  it('returns null when the bracket holds no sign change', () => {
    expect(brentRoot((x) => x * x + 1, -1, 1)).toBeNull();
  });

  it('golden-section maximum', () => {
    expect(goldenMaximum((x) => -((x - 0.3) ** 2), 0, 1, 1e-10)).toBeCloseTo(0.3, 7);
  });
});
