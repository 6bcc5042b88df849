import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * Ideal-gas power terms α⁰ = Σ nᵢ·τ^tᵢ.
 * Evaluated with Math.pow (the ideal part reads no power tables).
 * Scaled derivatives per term f = nτ^t: τα_τ = t·f, τ²α_ττ = t(t−1)·f, τ³α_τττ = t(t−1)(t−2)·f.
 */
export class IdealPower implements TermEvaluator {
	readonly kind = 'power';
	readonly maxD = 0;
	readonly maxT = 0;
	private readonly n: Float64Array;
	private readonly t: Float64Array;

	constructor(n: readonly number[], t: readonly number[]) {
		this.n = Float64Array.from(n);
		this.t = Float64Array.from(t);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, t } = this;
		const tau = ctx.tau;
		for (let i = 0; i < n.length; i++) {
			const ei = t[i];
			const f = n[i] * Math.pow(tau, ei);
			rec.a += f;
			if (order < 1) continue;
			rec.t1 += ei * f;
			if (order < 2) continue;
			rec.t2 += ei * (ei - 1) * f;
			if (order < 3) continue;
			rec.t3 += ei * (ei - 1) * (ei - 2) * f;
		}
	}
}
