/**
 * Fluid loading: validation of a FluidData file and compilation into evaluators.
 * A malformed file is refused with a ThermoError `invalid-fluid-data` naming the first bad field.
 */
import { ThermoError } from './errors.ts';
import {
	FLUID_GROUPS,
	type Ancillary,
	type FluidData,
	type IdealTerm,
	type ResidualTerm
} from './fluids/schema.ts';
import {
	AlphaRecord,
	EvalContext,
	type DerivativeOrder,
	type TermEvaluator
} from './terms/record.ts';
import { IdealLead } from './terms/ideal-lead.ts';
import { IdealLogTau } from './terms/ideal-log-tau.ts';
import { IdealPower } from './terms/ideal-power.ts';
import { IdealPlanckEinstein } from './terms/ideal-planck-einstein.ts';
import { IdealLogCPlusExp } from './terms/ideal-log-c-plus-exp.ts';
import { ResidualPolynomial } from './terms/residual-polynomial.ts';
import { ResidualExponential } from './terms/residual-exponential.ts';
import { ResidualGaussian } from './terms/residual-gaussian.ts';
import { ResidualNonAnalytic } from './terms/residual-non-analytic.ts';

function bad(id: string, field: string, what: string): never {
	throw new ThermoError(
		'invalid-fluid-data',
		`Fluid data "${id}" is malformed: ${field} ${what}.`,
		'Fix the fluid data file; the engine refuses malformed coefficients rather than guess.',
		{ field }
	);
}

function isObj(x: unknown): x is Record<string, unknown> {
	return typeof x === 'object' && x !== null && !Array.isArray(x);
}

class Checker {
	constructor(readonly id: string) {}
	obj(v: unknown, field: string): Record<string, unknown> {
		if (!isObj(v)) bad(this.id, field, 'is missing or not an object');
		return v;
	}
	str(v: unknown, field: string): string {
		if (typeof v !== 'string' || v.trim() === '')
			bad(this.id, field, 'is missing or not a non-empty string');
		return v;
	}
	num(v: unknown, field: string, positive = false): number {
		if (typeof v !== 'number' || !Number.isFinite(v))
			bad(this.id, field, 'is missing or not a finite number');
		if (positive && !(v > 0)) bad(this.id, field, 'must be positive');
		return v;
	}
	nums(v: unknown, field: string, length?: number): number[] {
		if (!Array.isArray(v)) bad(this.id, field, 'is missing or not an array of numbers');
		if (v.length === 0) bad(this.id, field, 'is empty');
		if (length !== undefined && v.length !== length)
			bad(this.id, field, `has ${v.length} entries; expected ${length} (same as n)`);
		v.forEach((x, i) => this.num(x, `${field}[${i}]`));
		return v as number[];
	}
}

function checkAncillary(c: Checker, v: unknown, field: string, Tt: number): void {
	const a = c.obj(v, field);
	if (a.form !== 'ln-ratio-tc-over-t' && a.form !== 'ln-ratio' && a.form !== 'ratio-plus-one')
		bad(c.id, `${field}.form`, 'is not one of ln-ratio-tc-over-t, ln-ratio, ratio-plus-one');
	const n = c.nums(a.n, `${field}.n`);
	c.nums(a.t, `${field}.t`, n.length);
	c.num(a.yc, `${field}.yc`, true);
	if (a.Tr !== undefined && !(c.num(a.Tr, `${field}.Tr`, true) > Tt))
		bad(c.id, `${field}.Tr`, 'must lie above triple.T');
	c.str(a.source, `${field}.source`);
}

/**
 * Check that `data` is a well-formed FluidData: every field present with the right type, every
 * coefficient finite, coefficient arrays of equal length, exactly one lead ideal term, known term
 * kinds, consistent limits. Throws ThermoError `invalid-fluid-data` with `field` set.
 */
export function validateFluidData(data: unknown): asserts data is FluidData {
	const id = isObj(data) && typeof data.id === 'string' ? data.id : '(unnamed)';
	const c = new Checker(id);
	const d = c.obj(data, 'fluid');
	c.str(d.id, 'id');
	c.str(d.name, 'name');
	c.str(d.formula, 'formula');
	if (!Array.isArray(d.aliases) || d.aliases.some((a) => typeof a !== 'string'))
		bad(id, 'aliases', 'is missing or not an array of strings');
	if (!FLUID_GROUPS.some((g) => g.id === d.group))
		bad(id, 'group', `is not one of ${FLUID_GROUPS.map((g) => g.id).join(', ')}`);
	const f = c.obj(d.formulation, 'formulation');
	c.str(f.name, 'formulation.name');
	c.str(f.reference, 'formulation.reference');
	c.str(f.provenance, 'formulation.provenance');
	c.num(d.molarMass, 'molarMass', true);
	c.num(d.R, 'R', true);
	const red = c.obj(d.reducing, 'reducing');
	c.num(red.T, 'reducing.T', true);
	c.num(red.rho, 'reducing.rho', true);
	const cr = c.obj(d.critical, 'critical');
	const Tc = c.num(cr.T, 'critical.T', true);
	const Pc = c.num(cr.P, 'critical.P', true);
	c.num(cr.rho, 'critical.rho', true);
	const tr = c.obj(d.triple, 'triple');
	const Tt = c.num(tr.T, 'triple.T', true);
	const Pt = c.num(tr.P, 'triple.P', true);
	const lim = c.obj(d.limits, 'limits');
	const Tmin = c.num(lim.Tmin, 'limits.Tmin', true);
	const Tmax = c.num(lim.Tmax, 'limits.Tmax', true);
	const Pmax = c.num(lim.Pmax, 'limits.Pmax', true);
	if (!(Tt < Tc)) bad(id, 'triple.T', 'must be below critical.T');
	if (!(Pt < Pc)) bad(id, 'triple.P', 'must be below critical.P');
	if (!(Tmin < Tc && Tc < Tmax)) bad(id, 'limits', 'must satisfy Tmin < critical.T < Tmax');
	if (!(Pmax > Pc)) bad(id, 'limits.Pmax', 'must be above critical.P');

	const rs = c.obj(d.referenceState, 'referenceState');
	c.str(rs.label, 'referenceState.label');
	if (rs.kind === 'saturated-liquid-at-T') {
		const T = c.num(rs.T, 'referenceState.T', true);
		if (!(T >= Tt && T < Tc))
			bad(id, 'referenceState.T', 'must lie between the triple and critical temperatures');
		c.num(rs.h, 'referenceState.h');
		c.num(rs.s, 'referenceState.s');
	} else if (rs.kind === 'saturated-liquid-at-P') {
		const P = c.num(rs.P, 'referenceState.P', true);
		if (!(P >= Pt && P < Pc))
			bad(id, 'referenceState.P', 'must lie between the triple and critical pressures');
		c.num(rs.h, 'referenceState.h');
		c.num(rs.s, 'referenceState.s');
	} else if (rs.kind === 'bubble-liquid-at-P') {
		c.num(rs.P, 'referenceState.P', true);
		c.num(rs.h, 'referenceState.h');
		c.num(rs.s, 'referenceState.s');
		if (!d.band) bad(id, 'referenceState.kind', 'bubble-liquid-at-P needs the fluid’s band');
	} else if (rs.kind !== 'as-published') {
		bad(
			id,
			'referenceState.kind',
			'is not one of as-published, saturated-liquid-at-T, saturated-liquid-at-P'
		);
	}

	if (!Array.isArray(d.ideal) || d.ideal.length === 0) bad(id, 'ideal', 'is missing or empty');
	let leads = 0;
	d.ideal.forEach((t: unknown, i: number) => {
		const p = `ideal[${i}]`;
		const o = c.obj(t, p);
		switch (o.kind) {
			case 'lead':
				leads++;
				c.num(o.a1, `${p}.a1`);
				c.num(o.a2, `${p}.a2`);
				break;
			case 'log-tau':
				c.num(o.a, `${p}.a`);
				break;
			case 'power': {
				const n = c.nums(o.n, `${p}.n`);
				c.nums(o.t, `${p}.t`, n.length);
				break;
			}
			case 'planck-einstein': {
				const n = c.nums(o.n, `${p}.n`);
				const g = c.nums(o.gamma, `${p}.gamma`, n.length);
				g.forEach((x, j) => c.num(x, `${p}.gamma[${j}]`, true));
				break;
			}
			case 'log-c-plus-exp': {
				const n = c.nums(o.n, `${p}.n`);
				const cs = c.nums(o.c, `${p}.c`, n.length);
				cs.forEach((x, j) => c.num(x, `${p}.c[${j}]`, true));
				c.nums(o.gamma, `${p}.gamma`, n.length);
				break;
			}
			default:
				bad(id, `${p}.kind`, 'is not one of lead, log-tau, power, planck-einstein, log-c-plus-exp');
		}
	});
	if (leads !== 1) bad(id, 'ideal', `must hold exactly one lead term (has ${leads})`);

	if (!Array.isArray(d.residual) || d.residual.length === 0)
		bad(id, 'residual', 'is missing or empty');
	d.residual.forEach((t: unknown, i: number) => {
		const p = `residual[${i}]`;
		const o = c.obj(t, p);
		const n = o.kind === undefined ? [] : c.nums(o.n, `${p}.n`);
		const same = (k: string) => c.nums(o[k], `${p}.${k}`, n.length);
		switch (o.kind) {
			case 'polynomial':
				same('d');
				same('t');
				break;
			case 'exponential':
				same('d');
				same('t');
				same('l').forEach((x, j) => c.num(x, `${p}.l[${j}]`, true));
				break;
			case 'gaussian':
				for (const k of ['d', 't', 'alpha', 'beta', 'gamma', 'epsilon']) same(k);
				break;
			case 'non-analytic':
				for (const k of ['a', 'b', 'beta', 'A', 'B', 'C', 'D']) same(k);
				same('beta').forEach((x, j) => c.num(x, `${p}.beta[${j}]`, true));
				break;
			default:
				bad(id, `${p}.kind`, 'is not one of polynomial, exponential, gaussian, non-analytic');
		}
	});

	const anc = c.obj(d.ancillaries, 'ancillaries');
	checkAncillary(c, anc.pSat, 'ancillaries.pSat', Tt);
	checkAncillary(c, anc.rhoLiquid, 'ancillaries.rhoLiquid', Tt);
	checkAncillary(c, anc.rhoVapor, 'ancillaries.rhoVapor', Tt);
}

/** Compiled ancillary equation y(T) (starting guesses only). */
export class AncillaryEq {
	private readonly n: Float64Array;
	private readonly t: Float64Array;
	private readonly form: Ancillary['form'];
	readonly yc: number;
	/** reducing temperature: the ancillary's own Tr, else the fluid's critical temperature */
	readonly Tc: number;
	constructor(a: Ancillary, criticalT: number) {
		this.n = Float64Array.from(a.n);
		this.t = Float64Array.from(a.t);
		this.form = a.form;
		this.yc = a.yc;
		this.Tc = a.Tr ?? criticalT;
	}
	/** Σ nᵢ·θ^tᵢ with θ = 1 − T/Tr clamped to ≥ 0 */
	private sum(T: number): number {
		const theta = 1 - T / this.Tc;
		if (!(theta > 0)) return 0;
		const lnTheta = Math.log(theta);
		let s = 0;
		for (let i = 0; i < this.n.length; i++) s += this.n[i] * Math.exp(this.t[i] * lnTheta);
		return s;
	}
	/** y(T) per the ancillary's form (schema.ts Ancillary) */
	value(T: number): number {
		const s = this.sum(T);
		switch (this.form) {
			case 'ln-ratio-tc-over-t':
				return this.yc * Math.exp((this.Tc / Math.min(T, this.Tc)) * s);
			case 'ln-ratio':
				return this.yc * Math.exp(s);
			case 'ratio-plus-one':
				return this.yc * (1 + s);
		}
	}
	/** T at which y(T) = y, by bisection on the (monotonic) ancillary between T1 and T2 */
	inverse(y: number, T1: number, T2: number): number {
		let lo = T1,
			hi = T2;
		const ylo = this.value(lo);
		const rising = this.value(hi) > ylo;
		for (let i = 0; i < 60; i++) {
			const mid = 0.5 * (lo + hi);
			const ym = this.value(mid);
			if (ym > y === rising) hi = mid;
			else lo = mid;
		}
		return 0.5 * (lo + hi);
	}
}

function compileIdeal(t: IdealTerm, a1a2?: { a1: number; a2: number }): TermEvaluator {
	switch (t.kind) {
		case 'lead':
			return new IdealLead(a1a2 ? a1a2.a1 : t.a1, a1a2 ? a1a2.a2 : t.a2);
		case 'log-tau':
			return new IdealLogTau(t.a);
		case 'power':
			return new IdealPower(t.n, t.t);
		case 'planck-einstein':
			return new IdealPlanckEinstein(t.n, t.gamma);
		case 'log-c-plus-exp':
			return new IdealLogCPlusExp(t.n, t.c, t.gamma);
	}
}

function compileResidual(t: ResidualTerm): TermEvaluator {
	switch (t.kind) {
		case 'polynomial':
			return new ResidualPolynomial(t.n, t.d, t.t);
		case 'exponential':
			return new ResidualExponential(t.n, t.d, t.t, t.l);
		case 'gaussian':
			return new ResidualGaussian(t.n, t.d, t.t, t.alpha, t.beta, t.gamma, t.epsilon);
		case 'non-analytic':
			return new ResidualNonAnalytic(t.n, t.a, t.b, t.beta, t.A, t.B, t.C, t.D);
	}
}

/**
 * A compiled fluid: its constants, term evaluators and scratch records. Internal to the engine.
 * `Tc`, `Pc`, `rhoc` start as the data file's critical point; the saturation module refines them to
 * the equation's own critical point on first use (see solvers/critical.ts).
 */
export class Fluid {
	readonly id: string;
	readonly data: FluidData;
	readonly R: number;
	/** reducing temperature and density of the equation */
	readonly Tr: number;
	readonly rhor: number;
	/** lower temperature limit used by the solvers: max(triple.T, limits.Tmin) */
	readonly Tmin: number;
	readonly Tmax: number;
	readonly Pmax: number;
	readonly Tt: number;
	Tc: number;
	Pc: number;
	rhoc: number;
	/** lead-term constants in use (after the reference-state shift) */
	readonly a1: number;
	readonly a2: number;
	readonly ideal: TermEvaluator[];
	readonly residual: TermEvaluator[];
	readonly ctx: EvalContext;
	readonly recI = new AlphaRecord();
	readonly recR = new AlphaRecord();
	readonly ancP: AncillaryEq;
	readonly ancRhoL: AncillaryEq;
	readonly ancRhoV: AncillaryEq;
	/** lazily built caches owned by the solvers (saturation table, state grid, critical point) */
	readonly cache: Record<string, unknown> = {};

	constructor(data: FluidData, lead?: { a1: number; a2: number }) {
		this.id = data.id;
		this.data = data;
		this.R = data.R;
		this.Tr = data.reducing.T;
		this.rhor = data.reducing.rho;
		this.Tt = data.triple.T;
		this.Tmin = Math.max(data.triple.T, data.limits.Tmin);
		this.Tmax = data.limits.Tmax;
		this.Pmax = data.limits.Pmax;
		this.Tc = data.critical.T;
		this.Pc = data.critical.P;
		this.rhoc = data.critical.rho;
		const leadTerm = data.ideal.find((t) => t.kind === 'lead') as { a1: number; a2: number };
		this.a1 = lead ? lead.a1 : leadTerm.a1;
		this.a2 = lead ? lead.a2 : leadTerm.a2;
		this.ideal = data.ideal.map((t) => compileIdeal(t, { a1: this.a1, a2: this.a2 }));
		this.residual = data.residual.map(compileResidual);
		let maxD = 0,
			maxT = 0;
		for (const t of [...this.ideal, ...this.residual]) {
			maxD = Math.max(maxD, t.maxD);
			maxT = Math.max(maxT, t.maxT);
		}
		this.ctx = new EvalContext(maxD, maxT);
		this.ancP = new AncillaryEq(data.ancillaries.pSat, data.critical.T);
		this.ancRhoL = new AncillaryEq(data.ancillaries.rhoLiquid, data.critical.T);
		this.ancRhoV = new AncillaryEq(data.ancillaries.rhoVapor, data.critical.T);
	}

	/**
	 * αʳ and derivatives up to `order` at (δ, τ), into one of two records (either may be overwritten
	 * by the next call but one). A call at the (δ, τ) of one of the last two evaluations, at its
	 * order or lower, returns that record as it stands (the same numbers; fields above the order
	 * asked for may then be set): a solver's final state is often evaluated where its last iteration
	 * already was (a Newton step below round-off), and a saturation solve's two phases alternate.
	 */
	residualAt(delta: number, tau: number, order: DerivativeOrder): AlphaRecord {
		if (delta === this.deltaA && tau === this.tauA && order <= this.orderA) return this.recR;
		if (delta === this.deltaB && tau === this.tauB && order <= this.orderB) return this.recB;
		// into the record not filled last; the other keeps its point
		const intoA = this.lastB;
		const rec = intoA ? this.recR : this.recB;
		rec.reset();
		this.ctx.set(delta, tau);
		const terms = this.residual;
		for (let i = 0; i < terms.length; i++) terms[i].add(this.ctx, order, rec);
		if (intoA) {
			this.deltaA = delta;
			this.tauA = tau;
			this.orderA = order;
		} else {
			this.deltaB = delta;
			this.tauB = tau;
			this.orderB = order;
		}
		this.lastB = !intoA;
		return rec;
	}

	/** the second record, and where each record was last evaluated and to which order */
	private readonly recB = new AlphaRecord();
	private deltaA = NaN;
	private tauA = NaN;
	private orderA = -1;
	private deltaB = NaN;
	private tauB = NaN;
	private orderB = -1;
	/** whether recB was filled last */
	private lastB = true;

	/**
	 * α⁰ and derivatives up to `order` at (δ, τ), into this.recI (overwritten by the next call).
	 * α⁰ depends on δ only through the lead term's ln δ, so the rest is cached for the last τ.
	 */
	idealAt(delta: number, tau: number, order: DerivativeOrder): AlphaRecord {
		const cache = this.idealCache;
		if (tau !== this.idealTau || order > this.idealOrder) {
			cache.reset();
			const ctx = this.idealCtx;
			ctx.setLogs(1, tau); // ln δ = 0: the record holds everything but the ln δ of the lead term
			const terms = this.ideal;
			for (let i = 0; i < terms.length; i++) terms[i].add(ctx, order, cache);
			this.idealTau = tau;
			this.idealOrder = order;
		}
		const rec = this.recI;
		rec.copyFrom(cache);
		rec.a += Math.log(delta);
		return rec;
	}

	private readonly idealCache = new AlphaRecord();
	private readonly idealCtx = new EvalContext(0, 0);
	private idealTau = NaN;
	private idealOrder = -1;
}
