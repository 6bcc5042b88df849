import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * Ideal-gas terms α⁰ = Σ nᵢ·ln(cᵢ + exp(γᵢτ)), cᵢ > 0 (the form of the last ideal-gas term of the
 * Lemmon, Jacobsen, Penoncello & Friend (2000) equation for air, with c = 2/3).
 * With q = exp(γτ)/(c + exp(γτ)) = 1/(1 + c·exp(−γτ)), the share of the exponential:
 *   α_τ = nγq,  α_ττ = nγ²q(1 − q),  α_τττ = nγ³q(1 − q)(1 − 2q);
 * value, first, second and third derivatives come out of one pass (one exp, one log per term),
 * scaled by τ, τ², τ³ as the record wants. ln(c + e^x) is taken as x + ln(1 + c·e^−x), so large
 * γτ cannot overflow.
 */
export class IdealLogCPlusExp implements TermEvaluator {
	readonly kind = 'log-c-plus-exp';
	readonly maxD = 0;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly c: Float64Array;
	private readonly gamma: Float64Array;

	constructor(n: readonly number[], c: readonly number[], gamma: readonly number[]) {
		this.n = Float64Array.from(n);
		this.c = Float64Array.from(c);
		this.gamma = Float64Array.from(gamma);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, c, gamma } = this;
		const tau = ctx.tau;
		for (let i = 0; i < n.length; i++) {
			const gt = gamma[i] * tau;
			const ce = c[i] * Math.exp(-gt); // c·e^(−γτ)
			rec.a += n[i] * (gt + Math.log1p(ce));
			if (order < 1) continue;
			const q = 1 / (1 + ce);
			const f1 = n[i] * gt * q;
			rec.t1 += f1;
			if (order < 2) continue;
			const oneMinusQ = ce * q; // 1 − q without cancellation
			const f2 = f1 * gt * oneMinusQ;
			rec.t2 += f2;
			if (order < 3) continue;
			rec.t3 += f2 * gt * (1 - 2 * q);
		}
	}
}
