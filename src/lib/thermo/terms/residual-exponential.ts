import { tableIndex, type AlphaRecord, type DerivativeOrder, type EvalContext, type TermEvaluator } from './record.ts';

/**
 * Residual exponential terms αʳ = Σ nᵢ·δ^dᵢ·τ^tᵢ·exp(−δ^lᵢ) (IAPWS R6-95(2018), Eq. 6, i = 8…51,
 * where the exponent lᵢ is printed as cᵢ).
 *
 * With L = δ^l and the log-derivative operator ϑ = δ·∂/∂δ acting on g = δ^d·exp(−L):
 *   ϑg = k·g,  ϑ²g = (k² − l²L)·g,  ϑ³g = (k³ − 3k·l²L − l³L)·g,  k = d − l·L,
 * and δ²g'' = (ϑ² − ϑ)g, δ³g''' = (ϑ³ − 3ϑ² + 2ϑ)g. The τ factor gives falling factorials of t.
 * exp(−δ^l) is computed once per distinct l. When every d, t, l is a small non-negative integer
 * the powers come from the context's tables (multiplications only); otherwise each term costs
 * one exp: δ^d·τ^t·exp(−L) = exp(d·ln δ + t·ln τ − L).
 */
export class ResidualExponential implements TermEvaluator {
	readonly kind = 'exponential';
	readonly maxD: number;
	readonly maxT: number;
	private readonly n: Float64Array;
	private readonly d: Float64Array;
	private readonly t: Float64Array;
	private readonly l: Float64Array;
	private readonly di: Int32Array;
	private readonly ti: Int32Array;
	/** index of each term's l in `lUnique` */
	private readonly lu: Int32Array;
	private readonly lUnique: Float64Array;
	private readonly Lcache: Float64Array;
	private readonly Ecache: Float64Array;
	private readonly tables: boolean;

	constructor(n: readonly number[], d: readonly number[], t: readonly number[], l: readonly number[]) {
		this.n = Float64Array.from(n);
		this.d = Float64Array.from(d);
		this.t = Float64Array.from(t);
		this.l = Float64Array.from(l);
		this.di = Int32Array.from(d.map(tableIndex));
		this.ti = Int32Array.from(t.map(tableIndex));
		const uniq = [...new Set(l)];
		this.lUnique = Float64Array.from(uniq);
		this.lu = Int32Array.from(l.map((x) => uniq.indexOf(x)));
		this.Lcache = new Float64Array(uniq.length);
		this.Ecache = new Float64Array(uniq.length);
		this.tables = [...this.di, ...this.ti, ...uniq.map(tableIndex)].every((k) => k >= 0);
		this.maxD = this.tables ? Math.max(0, ...this.di, ...uniq) : 0;
		this.maxT = this.tables ? Math.max(0, ...this.ti) : 0;
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { n, d, t, l, di, ti, lu, lUnique, Lcache, Ecache, tables } = this;
		const { dPow, tPow, lnDelta, lnTau } = ctx;
		for (let u = 0; u < lUnique.length; u++) {
			const L = tables ? dPow[lUnique[u]] : Math.exp(lUnique[u] * lnDelta);
			Lcache[u] = L;
			Ecache[u] = Math.exp(-L);
		}
		let a = 0, d1 = 0, t1 = 0, d2 = 0, t2 = 0, dt = 0, d3 = 0, t3 = 0, d2t = 0, dt2 = 0;
		for (let i = 0; i < n.length; i++) {
			const ui = lu[i];
			const f = tables
				? n[i] * dPow[di[i]] * tPow[ti[i]] * Ecache[ui]
				: n[i] * Math.exp(d[i] * lnDelta + t[i] * lnTau - Lcache[ui]);
			a += f;
			if (order < 1) continue;
			const L = Lcache[ui];
			const li = l[i];
			const k = d[i] - li * L;
			const T1 = t[i];
			d1 += k * f;
			t1 += T1 * f;
			if (order < 2) continue;
			const l2L = li * li * L;
			const a2 = k * k - l2L;
			const D2 = a2 - k;
			const T2 = T1 * (T1 - 1);
			d2 += D2 * f;
			t2 += T2 * f;
			dt += k * T1 * f;
			if (order < 3) continue;
			const a3 = k * k * k - 3 * k * l2L - li * l2L;
			d3 += (a3 - 3 * a2 + 2 * k) * f;
			t3 += T2 * (T1 - 2) * f;
			d2t += D2 * T1 * f;
			dt2 += k * T2 * f;
		}
		rec.a += a;
		rec.d1 += d1;
		rec.t1 += t1;
		rec.d2 += d2;
		rec.t2 += t2;
		rec.dt += dt;
		rec.d3 += d3;
		rec.t3 += t3;
		rec.d2t += d2t;
		rec.dt2 += dt2;
	}
}
