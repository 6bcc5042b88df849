/**
 * A water path by IAPWS-IF97: the IAPWS-95 path (computePath) re-fixed state by state.
 *
 * S1 is fixed by IF97 from the spec's start pair. Each leg's end is fixed by IF97 from the pair the
 * leg fixes it by: the leg's invariant taken from the IF97 start of the leg (isobaric P, isochoric v,
 * isothermal T, isentropic s, isenthalpic h; polytropic P·vⁿ = P₁v₁ⁿ) and the leg's target. Newton's
 * method starts from the IAPWS-95 state (fix.ts). Each leg's q and w then follow from its IF97 end
 * states by identities exact for the process, the same as the engine's (solvers/legs.ts):
 *
 * | process     | w = ∫P dv                           | q         | wShaft = −∫v dP | qFlow          |
 * | ----------- | ----------------------------------- | --------- | --------------- | -------------- |
 * | isobaric    | P·Δv                                | Δu + w    | 0               | Δh             |
 * | isochoric   | 0                                   | Δu        | −v·ΔP           | Δh + wShaft    |
 * | isothermal  | T·Δs − Δu                           | T·Δs      | w − Δ(Pv)       | T·Δs           |
 * | isentropic  | −Δu                                 | 0         | −Δh             | 0              |
 * | isenthalpic | 0 (throttling: irreversible)        | 0         | 0               | 0              |
 * | polytropic  | (P₂v₂ − P₁v₁)/(1 − n); n = 1: P₁v₁ ln(v₂/v₁) | Δu + w | w − Δ(Pv) (n = 0: 0) | Δh + wShaft |
 *
 * The legs' points between the ends, the crossings and the design-limit events stay IAPWS-95 (the
 * difference is far below a chart's resolution). A state IF97 cannot give keeps its IAPWS-95 value,
 * is marked `formulation: 'iapws95'` and named in an `if97-state-unavailable` warning; a leg with such
 * an end keeps its IAPWS-95 q and w.
 */
import { ThermoError } from '../errors.ts';
import type {
	Inputs,
	Leg,
	PathResult,
	PathSpec,
	PathState,
	PathWarning,
	Process,
	State,
	StateExtras,
	TargetName
} from '../types.ts';
import { PC, TC, psat, tsat } from './regions.ts';
import { if97FixFrom, type If97Seed } from './fix.ts';
import { if97Limits, if97State } from './state.ts';
import { cycleOf } from '../solvers/path.ts';

const seedOf = (st: State): If97Seed => ({ T: st.T, P: st.P, x: st.x, phase: st.phase });

const P_SAT_MIN = psat(if97Limits.Tmin) * 1e6;

/**
 * Superheat, subcooling and volume fractions of an IF97 state against IF97's own saturation line
 * (Eqs. 30/31), as the engine's stateExtras gives them for IAPWS-95.
 */
export function if97Extras(st: State): StateExtras {
	const out: StateExtras = {
		Tsat: null,
		superheat: null,
		subcooling: null,
		liquidVolumeFraction: null,
		vaporVolumeFraction: null
	};
	if (st.P >= P_SAT_MIN && st.P < PC * 1e6) {
		const Ts = tsat(st.P / 1e6);
		out.Tsat = Ts;
		if (st.phase === 'superheated-vapor') out.superheat = st.T - Ts;
		if (st.phase === 'saturated-vapor') out.superheat = 0;
		if (st.phase === 'compressed-liquid') out.subcooling = Ts - st.T;
		if (st.phase === 'saturated-liquid') out.subcooling = 0;
	}
	if (st.x !== null && st.T < TC) {
		const vV = if97State(psat(st.T) * 1e6, st.T, { side: 'vapor' }).v;
		const av = Math.min(1, Math.max(0, (st.x * vV) / st.v));
		out.vaporVolumeFraction = av;
		out.liquidVolumeFraction = 1 - av;
	}
	return out;
}

const INVARIANT: Record<Exclude<Process, 'polytropic'>, 'P' | 'v' | 'T' | 's' | 'h'> = {
	isobaric: 'P',
	isochoric: 'v',
	isothermal: 'T',
	isentropic: 's',
	isenthalpic: 'h'
};

/** The leg's target as [property, value] with ρ read as v. */
function targetPair(
	target: Partial<Record<TargetName, number>>
): ['T' | 'P' | 'v' | 'u' | 'h' | 's' | 'x', number] {
	const [k, x] = Object.entries(target).find(([, y]) => y !== undefined) as [TargetName, number];
	return k === 'rho' ? ['v', 1 / x] : [k, x];
}

/** The IF97 end of a polytropic leg: P·vⁿ = P₁v₁ⁿ and the target, by Newton in ln v from the IAPWS-95 end. */
function polytropicEnd(start: State, n: number, target: [string, number], seed: State): State {
	const C = start.P * start.v ** n;
	const [k, value] = target;
	if (k === 'P' && n !== 0)
		return if97FixFrom({ P: value, v: (C / value) ** (1 / n) }, seedOf(seed));
	if (k === 'v') return if97FixFrom({ P: C / value ** n, v: value }, seedOf(seed));
	const at = (lnv: number) => {
		const v = Math.exp(lnv);
		return if97FixFrom({ P: C / v ** n, v }, seedOf(seed));
	};
	const f = (lnv: number): number => {
		const st = at(lnv);
		const y = st[k as keyof State] as number;
		return k === 'P' || k === 'T' ? Math.log(y / value) : (y - value) / (Math.abs(value) + 1e3);
	};
	let y = Math.log(seed.v);
	let fy = f(y);
	for (let i = 0; i < 40 && Math.abs(fy) > 1e-12; i++) {
		const h = 1e-7;
		const d = (f(y + h) - fy) / h;
		if (!Number.isFinite(d) || d === 0) break;
		y -= fy / d;
		fy = f(y);
	}
	if (!(Math.abs(fy) <= 1e-9))
		throw new ThermoError(
			'no-convergence',
			`IAPWS-IF97: no end found for this polytropic leg (P·v^${n} = const, ${k} = ${value}).`,
			'Use IAPWS-95 for this sheet.'
		);
	return at(y);
}

/** q, w, wShaft, qFlow and the differences of a leg between two IF97 states (the table above). */
export function if97LegEnergy(
	process: Process,
	start: State,
	end: State,
	n?: number
): Pick<Leg, 'q' | 'w' | 'wShaft' | 'qFlow' | 'du' | 'dh' | 'ds'> {
	const du = end.u - start.u;
	const dh = end.h - start.h;
	const ds = end.s - start.s;
	const dPv = end.P * end.v - start.P * start.v;
	let w: number;
	let wShaft: number;
	switch (process) {
		case 'isobaric':
			w = start.P * (end.v - start.v);
			wShaft = 0;
			break;
		case 'isochoric':
			w = 0;
			wShaft = -start.v * (end.P - start.P);
			break;
		case 'isothermal':
			w = start.T * ds - du;
			wShaft = w - dPv;
			break;
		case 'isentropic':
			w = -du;
			wShaft = -dh;
			break;
		case 'isenthalpic':
			return { q: 0, w: 0, wShaft: 0, qFlow: 0, du, dh, ds };
		case 'polytropic': {
			const k = n ?? 1;
			w =
				k === 1
					? start.P * start.v * Math.log(end.v / start.v)
					: (end.P * end.v - start.P * start.v) / (1 - k);
			wShaft = k === 0 ? 0 : w - dPv;
			break;
		}
	}
	return { q: du + w, w, wShaft, qFlow: dh + wShaft, du, dh, ds };
}

function unavailable(id: string, leg: string | undefined, e: unknown): PathWarning {
	const why = e instanceof ThermoError ? e.message : String(e);
	const w: PathWarning = {
		code: 'if97-state-unavailable',
		severity: 'warning',
		message: `${id}: IAPWS-IF97 cannot give this state, so it is shown by IAPWS-95. ${why}`,
		state: id
	};
	if (leg !== undefined) w.leg = leg;
	return w;
}

/**
 * The IAPWS-95 path `base` (computePath of `spec`) with its states and legs' energies by IAPWS-IF97
 * (module comment). Each state keeps its IAPWS-95 value as `iapws95`. Never throws for a state IF97
 * cannot give: that state stays IAPWS-95 with a warning.
 */
export function if97Path(spec: PathSpec, base: PathResult): PathResult {
	const warnings: PathWarning[] = [];
	const states: PathState[] = [];
	const fix = (
		inputs: () => Inputs | State,
		seed: State,
		id: string,
		leg?: string
	): PathState['state'] | null => {
		try {
			const got = inputs();
			return 'phase' in got ? (got as State) : if97FixFrom(got as Inputs, seedOf(seed));
		} catch (e) {
			if (!(e instanceof ThermoError)) throw e;
			warnings.push(unavailable(id, leg, e));
			return null;
		}
	};
	const put = (ps: PathState, st: State | null) => {
		const base95 = ps.state;
		if (st)
			states.push({
				...ps,
				state: st,
				extras: if97Extras(st),
				iapws95: base95,
				formulation: 'if97'
			});
		else states.push({ ...ps, iapws95: base95, formulation: 'iapws95' });
	};
	put(
		base.states[0],
		fix(() => spec.start, base.states[0].state, base.states[0].id)
	);
	const legs = base.legs.map((pl, i) => {
		const ls = spec.legs[i];
		const from = states[i];
		const end95 = base.states[i + 1];
		const target = targetPair(ls.target);
		const st = fix(
			() => {
				if (ls.process === 'polytropic')
					return polytropicEnd(from.state, ls.n ?? 1, target, end95.state);
				const inv = INVARIANT[ls.process];
				return { [inv]: from.state[inv], [target[0]]: target[1] } as Inputs;
			},
			end95.state,
			end95.id,
			pl.id
		);
		put(end95, st);
		const to = states[i + 1];
		if (from.formulation !== 'if97' || to.formulation !== 'if97') return pl;
		const e = if97LegEnergy(ls.process, from.state, to.state, ls.n);
		const leg: Leg = { ...pl.leg, ...e, start: from.state, end: to.state };
		leg.points = [from.state, ...pl.leg.points.slice(1, -1), to.state];
		return { ...pl, leg };
	});
	const closed = base.system.kind === 'closed';
	const s1 = states[0].state;
	const m =
		spec.system.kind === 'closed'
			? (spec.system.mass ?? (spec.system.volume !== undefined ? spec.system.volume / s1.v : 1))
			: spec.system.massFlow;
	const system: PathResult['system'] =
		spec.system.kind === 'closed'
			? { kind: 'closed', mass: m, volume: m * s1.v }
			: { kind: 'flow', massFlow: m };
	const unit = base.totals.unit;
	const totals = (q: number, w: number, wShaft: number, qFlow: number) => ({
		unit,
		Q: m * q,
		W: m * w,
		WShaft: m * wShaft,
		QFlow: m * qFlow
	});
	const per = { q: 0, w: 0, wShaft: 0, qFlow: 0, du: 0, dh: 0, ds: 0 };
	const outLegs = legs.map((pl) => {
		const l = pl.leg;
		per.q += l.q;
		per.w += l.w;
		per.wShaft += l.wShaft;
		per.qFlow += l.qFlow;
		return { ...pl, totals: totals(l.q, l.w, l.wShaft, l.qFlow) };
	});
	const last = states[states.length - 1].state;
	per.du = last.u - s1.u;
	per.dh = last.h - s1.h;
	per.ds = last.s - s1.s;
	let cycle = base.cycle;
	if (cycle) cycle = cycleOf(outLegs, closed, m, unit);
	return {
		...base,
		system,
		states,
		legs: outLegs,
		perKg: per,
		totals: totals(per.q, per.w, per.wShaft, per.qFlow),
		cycle,
		warnings: [...base.warnings, ...warnings],
		formulation: 'if97'
	};
}
