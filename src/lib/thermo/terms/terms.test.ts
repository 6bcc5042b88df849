/**
 * Each Helmholtz term kind: value and every derivative to third order against central finite
 * differences of the next lower order (internal consistency; coefficients are arbitrary test data,
 * chosen to exercise integer and fractional exponents).
 */
import { describe, expect, it } from 'vitest';
import {
	AlphaRecord,
	EvalContext,
	PowerSet,
	type DerivativeOrder,
	type TermEvaluator
} from './record.ts';
import { IdealLead } from './ideal-lead.ts';
import { IdealLogTau } from './ideal-log-tau.ts';
import { IdealPower } from './ideal-power.ts';
import { IdealPlanckEinstein } from './ideal-planck-einstein.ts';
import { IdealLogCPlusExp } from './ideal-log-c-plus-exp.ts';
import { ResidualPolynomial } from './residual-polynomial.ts';
import { ResidualExponential } from './residual-exponential.ts';
import { ResidualGaussian } from './residual-gaussian.ts';
import { ResidualNonAnalytic } from './residual-non-analytic.ts';

function evaluate(
	term: TermEvaluator,
	delta: number,
	tau: number,
	order: DerivativeOrder
): AlphaRecord {
	const ctx = new EvalContext(Math.max(term.maxD, 1), Math.max(term.maxT, 1));
	ctx.set(delta, tau);
	const rec = new AlphaRecord();
	term.add(ctx, order, rec);
	return rec;
}

/** Unscaled derivative ∂^(i+j)α/∂δ^i∂τ^j from the scaled record. */
function raw(r: AlphaRecord, i: number, j: number, delta: number, tau: number): number {
	const key: Record<string, keyof AlphaRecord> = {
		'00': 'a',
		'10': 'd1',
		'01': 't1',
		'20': 'd2',
		'02': 't2',
		'11': 'dt',
		'30': 'd3',
		'03': 't3',
		'21': 'd2t',
		'12': 'dt2'
	};
	return (r[key[`${i}${j}`]] as number) / (delta ** i * tau ** j);
}

const cases: [string, TermEvaluator][] = [
	['ideal lead', new IdealLead(-8.3, 6.7)],
	['ideal log-tau', new IdealLogTau(3.00632)],
	['ideal power', new IdealPower([1.2, -0.7, 0.3], [-0.5, 1.5, 2])],
	['ideal Planck–Einstein', new IdealPlanckEinstein([0.97, 1.28], [3.5, 7.7])],
	['ideal ln(c + exp(γτ))', new IdealLogCPlusExp([-0.2, 0.7], [2 / 3, 1.5], [0.9, 2.4])],
	[
		'residual polynomial (t in eighths: one root)',
		new ResidualPolynomial([0.0125, 7.9, -0.3], [1, 2, 4], [-0.5, 0.875, 1])
	],
	[
		'residual polynomial (general exponents)',
		new ResidualPolynomial([0.3, -0.2, 0.05], [1.5, 2, 3], [0.3, 1.7, -0.9])
	],
	[
		'residual exponential (integer exponents)',
		new ResidualExponential([-0.67, 0.2, 0.016, -0.02], [1, 2, 5, 3], [4, 6, 1, 10], [1, 2, 2, 6])
	],
	[
		'residual exponential (fractional exponents)',
		new ResidualExponential([-0.67, 0.2], [1.5, 2], [4.25, 0.5], [1, 2.5])
	],
	[
		'residual Gaussian',
		new ResidualGaussian(
			[-31.3, 31.5, -2521],
			[3, 3, 3],
			[0, 1, 4],
			[20, 20, 20],
			[150, 150, 250],
			[1.21, 1.21, 1.25],
			[1, 1, 1]
		)
	],
	[
		'residual non-analytic',
		new ResidualNonAnalytic(
			[-0.1487, 0.318],
			[3.5, 3.5],
			[0.85, 0.95],
			[0.3, 0.3],
			[0.32, 0.32],
			[0.2, 0.2],
			[28, 32],
			[700, 800]
		)
	]
];

// points away from δ = τ = 1 (where the non-analytic term is singular), on both sides of 1
const points: [number, number][] = [
	[0.6, 1.15],
	[1.3, 0.92],
	[2.6, 1.9],
	[1.05, 1.03]
];

describe('Helmholtz terms: derivatives against finite differences', () => {
	for (const [name, term] of cases) {
		it(name, () => {
			for (const [d, t] of points) {
				const r = evaluate(term, d, t, 3);
				// each derivative of order n against the central difference of the order n − 1 one
				const pairs: [number, number, number, number][] = [
					[1, 0, 0, 0],
					[0, 1, 0, 0],
					[2, 0, 1, 0],
					[0, 2, 0, 1],
					[1, 1, 0, 1],
					[3, 0, 2, 0],
					[0, 3, 0, 2],
					[2, 1, 1, 1],
					[1, 2, 1, 1]
				];
				for (const [i, j, li, lj] of pairs) {
					const byDelta = i > li;
					const hp = byDelta ? 1e-4 * d : 1e-4 * t;
					// reference: the five-point central difference of the lower derivative, error O(h⁴)
					// (Abramowitz & Stegun (1964), 25.3.6 — from memory); with h = 1e−4 relative the
					// round-off floor is ~1e−12/h, so 2e−7 is a common-practice bound
					const f = (k: number) => {
						const dd = byDelta ? d + k * hp : d,
							tt = byDelta ? t : t + k * hp;
						return raw(evaluate(term, dd, tt, 3), li, lj, dd, tt);
					};
					const fd = (8 * (f(1) - f(-1)) - (f(2) - f(-2))) / (12 * hp);
					const an = raw(r, i, j, d, t);
					const scale = Math.max(Math.abs(an), Math.abs(raw(r, li, lj, d, t)), 1e-8);
					expect(Math.abs(an - fd) / scale, `${name} at δ=${d}, τ=${t}: ∂${i}${j}`).toBeLessThan(
						2e-7
					);
				}
				// lower orders leave the higher fields untouched and agree with the full evaluation (the
				// reference here is the order-3 evaluation checked above; 12 digits is round-off)
				for (const o of [0, 1, 2] as DerivativeOrder[]) {
					const ro = evaluate(term, d, t, o);
					expect(ro.a).toBeCloseTo(r.a, 12);
					if (o >= 1) expect(ro.d1).toBeCloseTo(r.d1, 12);
					if (o >= 2) expect(ro.dt).toBeCloseTo(r.dt, 12);
					if (o < 3) expect(ro.d3).toBe(0);
					if (o < 2) expect(ro.t2).toBe(0);
					if (o < 1) expect(ro.t1).toBe(0);
				}
			}
		});
	}
});

describe('Helmholtz terms: far bells skipped without effect', () => {
	it('Gaussian and non-analytic terms change no record field by more than 1e−30 when skipped', async () => {
		const { getCompiledFluid } = await import('../registry.ts');
		for (const id of ['water', 'carbon-dioxide', 'nitrogen']) {
			const fl = getCompiledFluid(id);
			const pairs: [TermEvaluator, TermEvaluator][] = [];
			for (const t of fl.data.residual) {
				if (t.kind === 'gaussian')
					pairs.push([
						new ResidualGaussian(t.n, t.d, t.t, t.alpha, t.beta, t.gamma, t.epsilon),
						new ResidualGaussian(t.n, t.d, t.t, t.alpha, t.beta, t.gamma, t.epsilon, Infinity)
					]);
				if (t.kind === 'non-analytic')
					pairs.push([
						new ResidualNonAnalytic(t.n, t.a, t.b, t.beta, t.A, t.B, t.C, t.D),
						new ResidualNonAnalytic(t.n, t.a, t.b, t.beta, t.A, t.B, t.C, t.D, Infinity)
					]);
			}
			expect(pairs.length).toBeGreaterThan(0);
			let skipped = 0,
				worst = 0,
				where = '';
			for (let i = 0; i <= 60; i++)
				for (let j = 0; j <= 60; j++) {
					const T = fl.Tmin + ((fl.Tmax - fl.Tmin) * i) / 60;
					const delta = 1e-6 + (4.5 * fl.rhoc * j) / (60 * fl.rhor);
					const full = fl.residualAt(delta, fl.Tr / T, 3);
					const scale = { ...full } as Record<string, number>;
					for (const [fast, exact] of pairs) {
						const a = evaluate(fast, delta, fl.Tr / T, 3),
							b = evaluate(exact, delta, fl.Tr / T, 3);
						if (a.a === 0 && b.a !== 0) skipped++;
						for (const k of [
							'a',
							'd1',
							't1',
							'd2',
							't2',
							'dt',
							'd3',
							't3',
							'd2t',
							'dt2'
						] as const) {
							const e = Math.abs(a[k] - b[k]) / Math.max(1, Math.abs(scale[k]));
							if (e > worst) [worst, where] = [e, `${k} at T=${T}, δ=${delta}`];
						}
					}
				}
			// reference: the same terms evaluated without the skip (exact), 1e−30 relative to each field
			expect(worst, `${id}: ${where}`).toBeLessThan(1e-30);
			// the skip does happen over most of the range
			expect(skipped).toBeGreaterThan(1000);
		}
	});
});

describe('Helmholtz terms: ln(c + exp(γτ)) value', () => {
	it('equals n·ln(c + e^(γτ)) written out directly, and stays finite where e^(γτ) overflows', () => {
		// the defining formula, evaluated directly with Math.log/Math.exp (no shared code with the term)
		for (const [n, c, g, tau] of [
			[-0.197938904, 2 / 3, 87.31279, 1.2],
			[0.5, 1.5, 2.4, 0.6],
			[1.3, 0.1, 0.9, 2.6]
		]) {
			const r = evaluate(new IdealLogCPlusExp([n], [c], [g]), 1, tau, 0);
			const direct = n * Math.log(c + Math.exp(g * tau));
			expect(Math.abs(r.a - direct)).toBeLessThan(1e-13 * Math.max(1, Math.abs(direct)));
		}
		// γτ = 800: e^(γτ) is Infinity in doubles, the term is n·γτ plus a negligible ln(1 + c·e^(−γτ))
		const far = evaluate(new IdealLogCPlusExp([2], [2 / 3], [400]), 1, 2, 3);
		expect(far.a).toBeCloseTo(1600, 9);
		expect(far.t1).toBeCloseTo(1600, 9);
		expect(Math.abs(far.t2)).toBeLessThan(1e-300);
	});
});

describe('PowerSet: x^e by multiplication and square roots', () => {
	it('agrees with Math.pow to a few units in the last place, for each route', () => {
		const sets: [number, number[]][] = [
			[1, [0, 1, 2, 7, 16, 50]],
			[2, [0.5, 1.5, 3, 28.5]],
			[4, [0.25, 0.75, 2.25, 16]],
			[8, [-0.5, 0.125, 0.375, 0.875, 1]],
			[0, [0.629, 1.704, 3.3, 8.4]]
		];
		for (const [q, es] of sets) {
			const ps = new PowerSet(es);
			expect(ps.q, `exponents ${es.join(', ')}`).toBe(q);
			const out = new Float64Array(es.length);
			for (const x of [0.3, 0.97, 1, 1.08, 2.6, 4.5]) {
				ps.fill(x, Math.log(x), out);
				es.forEach((e, i) => {
					// reference: the runtime's Math.pow; 1e−14 relative is a few dozen ulps (common practice)
					const ref = Math.pow(x, e);
					expect(Math.abs(out[i] - ref), `${x}^${e}`).toBeLessThanOrEqual(1e-14 * ref);
				});
			}
		}
	});
});
