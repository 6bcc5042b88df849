import { describe, expect, it } from 'vitest';
import { integrate } from './quadrature.ts';

describe('adaptive Gauss–Kronrod quadrature', () => {
	it('integrates polynomials exactly; up to degree 13 both rules agree and one interval does', () => {
		// exact values by calculus: ∫₀¹ tᵏ dt = 1/(k + 1). The 7-point Gauss rule is exact to degree 13
		// and its 15-point Kronrod extension to degree 22 (Kronrod 1965; Piessens et al., QUADPACK
		// (1983) — from memory), so up to degree 13 one interval of 15 evaluations suffices
		for (const k of [0, 1, 5, 13, 17, 22]) {
			const r = integrate((t) => t ** k, 0, 1, 1e-14);
			expect(Math.abs(r.value - 1 / (k + 1))).toBeLessThan(1e-14);
			if (k <= 13) expect(r.evaluations).toBe(15);
		}
	});
	it('reaches the tolerance on smooth functions with steep parts (exact values by calculus)', () => {
		// ∫ eᵗ dt = e⁴ − e⁻³; ∫ t^(−1/2) dt = 2(1 − √1e−4); ∫ dt/(a² + t²) = (2/a)·atan(1/a) with a = 1e−2
		const e = integrate(Math.exp, -3, 4, 1e-12);
		expect(Math.abs(e.value - (Math.exp(4) - Math.exp(-3)))).toBeLessThan(1e-11 * e.value);
		const s = integrate((t) => 1 / Math.sqrt(t), 1e-4, 1, 1e-10);
		expect(Math.abs(s.value - 2 * (1 - 1e-2))).toBeLessThan(1e-9);
		const b = integrate((t) => 1 / (1e-4 + t * t), -1, 1, 1e-10);
		expect(Math.abs(b.value - 2e2 * Math.atan(1e2))).toBeLessThan(1e-8 * b.value);
	});
	it('integrates backwards with the sign flipped and stops within its evaluation budget on noise', () => {
		// ∫₁⁰ t dt = −1/2 (calculus); the noise averages to 1 over [0, 1]
		expect(integrate((t) => t, 1, 0).value).toBeCloseTo(-0.5, 14);
		let i = 0;
		const noisy = integrate(() => 1 + (i++ % 2 ? 1e-9 : -1e-9), 0, 1, 1e-15, 0, 16, 500);
		expect(noisy.evaluations).toBeLessThanOrEqual(500);
		expect(Math.abs(noisy.value - 1)).toBeLessThan(1e-8);
	});
});
