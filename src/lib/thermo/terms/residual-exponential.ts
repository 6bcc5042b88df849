import {
	PowerSet,
	tableIndex,
	type AlphaRecord,
	type DerivativeOrder,
	type EvalContext,
	type TermEvaluator
} from './record.ts';

/**
 * Residual exponential terms αʳ = Σ nᵢ·δ^dᵢ·τ^tᵢ·exp(−δ^lᵢ) (IAPWS R6-95(2018), Eq. 6, i = 8…51,
 * where the exponent lᵢ is printed as cᵢ).
 *
 * With L = δ^l and the log-derivative operator ϑ = δ·∂/∂δ acting on g = δ^d·exp(−L):
 *   ϑg = k·g,  ϑ²g = (k² − l²L)·g,  ϑ³g = (k³ − 3k·l²L − l³L)·g,  k = d − l·L,
 * and δ²g'' = (ϑ² − ϑ)g, δ³g''' = (ϑ³ − 3ϑ² + 2ϑ)g. The τ factor gives falling factorials of t.
 * The terms are kept grouped by l, so exp(−δ^l) is computed once per group and the inner loop
 * reads no per-term l. The τ part nᵢ·τ^tᵢ is kept for the last τ seen (PowerSet: multiplications
 * and square roots when every t is a multiple of 1/8, as for all but a few fluids, else one exp per
 * term), so a solver holding T fixed (density and saturation iterations) pays no exp per term; δ^d
 * and δ^l come from the context's table when they are small integers (every registered fluid's),
 * otherwise each costs one exp.
 */
export class ResidualExponential implements TermEvaluator {
	readonly kind = 'exponential';
	readonly maxD: number;
	readonly maxT = 0;
	/** per term, in order of rising l */
	private readonly n: Float64Array;
	private readonly d: Float64Array;
	private readonly t: Float64Array;
	private readonly di: Int32Array;
	/** the distinct l, and where each group's terms start (groupStart[g] … groupStart[g + 1] − 1) */
	private readonly groupL: Float64Array;
	private readonly groupStart: Int32Array;
	/** δ^d and δ^l from the context's table */
	private readonly tables: boolean;
	private readonly tPows: PowerSet;
	/** nᵢ·τ^tᵢ at tauAt */
	private readonly nt: Float64Array;
	private tauAt = NaN;

	constructor(
		n: readonly number[],
		d: readonly number[],
		t: readonly number[],
		l: readonly number[]
	) {
		const order = l.map((_, i) => i).sort((a, b) => l[a] - l[b] || a - b);
		this.n = Float64Array.from(order, (i) => n[i]);
		this.d = Float64Array.from(order, (i) => d[i]);
		this.t = Float64Array.from(order, (i) => t[i]);
		this.di = Int32Array.from(order, (i) => tableIndex(d[i]));
		const ls: number[] = [],
			starts: number[] = [];
		order.forEach((i, k) => {
			if (k === 0 || l[i] !== l[order[k - 1]]) {
				ls.push(l[i]);
				starts.push(k);
			}
		});
		starts.push(order.length);
		this.groupL = Float64Array.from(ls);
		this.groupStart = Int32Array.from(starts);
		this.tables = [...this.di, ...ls.map(tableIndex)].every((k) => k >= 0);
		this.maxD = this.tables ? Math.max(0, ...this.di, ...ls) : 0;
		this.tPows = new PowerSet(this.t);
		this.nt = new Float64Array(order.length);
	}

	add(ctx: EvalContext, order: DerivativeOrder, rec: AlphaRecord): void {
		const { d, t, di, nt, groupL, groupStart, tables } = this;
		if (ctx.tau !== this.tauAt) {
			const n = this.n;
			this.tPows.fill(ctx.tau, ctx.lnTau, nt);
			for (let i = 0; i < n.length; i++) nt[i] *= n[i];
			this.tauAt = ctx.tau;
		}
		const { dPow, lnDelta } = ctx;
		let a = 0,
			d1 = 0,
			t1 = 0,
			d2 = 0,
			t2 = 0,
			dt = 0,
			d3 = 0,
			t3 = 0,
			d2t = 0,
			dt2 = 0;
		for (let g = 0; g < groupL.length; g++) {
			const l = groupL[g];
			const L = tables ? dPow[l] : Math.exp(l * lnDelta);
			const E = Math.exp(-L);
			const lL = l * L,
				l2L = l * lL;
			const end = groupStart[g + 1];
			for (let i = groupStart[g]; i < end; i++) {
				const f = tables ? nt[i] * dPow[di[i]] * E : nt[i] * Math.exp(d[i] * lnDelta - L);
				a += f;
				if (order < 1) continue;
				const k = d[i] - lL;
				const T1 = t[i];
				d1 += k * f;
				t1 += T1 * f;
				if (order < 2) continue;
				const a2 = k * k - l2L;
				const D2 = a2 - k;
				const T2 = T1 * (T1 - 1);
				d2 += D2 * f;
				t2 += T2 * f;
				dt += k * T1 * f;
				if (order < 3) continue;
				const a3 = k * k * k - 3 * k * l2L - l * l2L;
				d3 += (a3 - 3 * a2 + 2 * k) * f;
				t3 += T2 * (T1 - 2) * f;
				d2t += D2 * T1 * f;
				dt2 += k * T2 * f;
			}
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
