import type { AlphaRecord, DerivativeOrder, EvalContext, TermEvaluator } from './record.ts';

/**
 * Ideal-gas lead term α⁰ = ln δ + a1 + a2·τ (IAPWS R6-95(2018), Eq. 5, first three terms).
 * Scaled derivatives: δα_δ = 1, δ²α_δδ = −1, δ³α_δδδ = 2, τα_τ = a2·τ; the rest vanish.
 * a1 and a2 are the constants the reference state fixes (see fluid loading).
 */
export class IdealLead implements TermEvaluator {
	readonly kind = 'lead';
	readonly maxD = 0;
	readonly maxT = 0;
	constructor(
		readonly a1: number,
		readonly a2: number
	) {}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const a2tau = this.a2 * ctx.tau;
		rec.a += ctx.lnDelta + this.a1 + a2tau;
		if (order < 1) return;
		rec.d1 += 1;
		rec.t1 += a2tau;
		if (order < 2) return;
		rec.d2 -= 1;
		if (order < 3) return;
		rec.d3 += 2;
	}
}
