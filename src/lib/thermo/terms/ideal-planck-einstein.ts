import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * Ideal-gas Planck–Einstein terms α⁰ = Σ nᵢ·ln(1 − exp(−γᵢτ)) (IAPWS R6-95(2018), Eq. 5, i = 4…8).
 * With E = exp(−γτ) and w = E/(1 − E) = 1/(exp(γτ) − 1):
 *   α_τ = nγw,  α_ττ = −nγ²w(1 + w),  α_τττ = nγ³w(1 + w)(1 + 2w);
 * the record takes them scaled by τ, τ², τ³.
 */
export class IdealPlanckEinstein implements TermEvaluator {
	readonly kind = 'planck-einstein';
	readonly maxD = 0;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly gamma: Float64Array;

	constructor(n: readonly number[], gamma: readonly number[]) {
		this.n = Float64Array.from(n);
		this.gamma = Float64Array.from(gamma);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, gamma } = this;
		const tau = ctx.tau;
		for (let i = 0; i < n.length; i++) {
			const gt = gamma[i] * tau;
			const E = Math.exp(-gt);
			rec.a += n[i] * Math.log1p(-E);
			if (order < 1) continue;
			const w = E / (1 - E);
			const f1 = n[i] * gt * w;
			rec.t1 += f1;
			if (order < 2) continue;
			const f2 = f1 * gt * (1 + w);
			rec.t2 -= f2;
			if (order < 3) continue;
			rec.t3 += f2 * gt * (1 + 2 * w);
		}
	}
}
