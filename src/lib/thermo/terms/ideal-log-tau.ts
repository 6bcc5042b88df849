import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * Ideal-gas term α⁰ = a·ln τ.
 * Scaled derivatives: τα_τ = a, τ²α_ττ = −a, τ³α_τττ = 2a; δ derivatives vanish.
 */
export class IdealLogTau implements TermEvaluator {
	readonly kind = 'log-tau';
	readonly maxD = 0;
	readonly maxT = 0;
	constructor(readonly coefficient: number) {}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const a = this.coefficient;
		rec.a += a * ctx.lnTau;
		if (order < 1) return;
		rec.t1 += a;
		if (order < 2) return;
		rec.t2 -= a;
		if (order < 3) return;
		rec.t3 += 2 * a;
	}
}
