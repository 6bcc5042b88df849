/**
 * Paths: a chain of legs from a start state (the sheet spec, docs/compute-api.md), with totals for the
 * system's size, the cycle analysis when the path closes, design-limit events found exactly along
 * each leg, per-state extras practitioners read, and warnings with stable codes.
 *
 * Warning codes and when they appear (types.ts PathWarningCode):
 * - pressure-equipment-caution: the path has design limits, or a leg ends above one — the brief's
 *   code-deferral caution (severity caution), once per path.
 * - design-pressure-reached / -exceeded, relief-set-pressure-reached / -exceeded,
 *   design-temperature-reached / -exceeded: a leg reaches the limit (first state along it, exactly)
 *   and ends at it / goes beyond it; also for a start already beyond (severity warning).
 * - below-minimum-temperature: a leg reaches a temperature at or below the minimum temperature.
 * - relief-set-above-design-pressure: the relief set pressure is above the design pressure.
 * - liquid-full: a closed-system leg crosses the saturated-liquid line from the two-phase side into
 *   compressed liquid (or ends on it from inside the dome): the state where it goes liquid-full
 *   (onset 'crossing'); or an isochoric leg heats a closed system that is compressed liquid at the
 *   leg's start (onset 'start'). Both carry (∂P/∂T)ᵥ at that state (dPdT, Pa/K).
 * - liquid-full-ahead: a closed-system isochoric heating leg that stays two-phase with a mean density
 *   above the critical density: heated further it would end liquid-full (info).
 * - throttling-irreversible: an isenthalpic leg (info).
 * - per-kg-totals: a closed system without mass or volume: totals are per 1 kg (info).
 */
import { LIQUID_FULL_CAUTION, PRESSURE_EQUIPMENT_CAUTION } from '../cautions.ts';
import { DEFAULT_ATMOSPHERE } from '../constants.ts';
import { ThermoError, fmt } from '../errors.ts';
import type { Fluid } from '../fluid.ts';
import { evalPoint, Point } from '../properties.ts';
import { getCompiledFluid } from '../registry.ts';
import {
	DESIGN_LIMIT_LABEL,
	DESIGN_LIMIT_NAMES,
	type CycleAnalysis,
	type DesignLimitName,
	type DesignLimits,
	type LimitEvent,
	type PathLeg,
	type PathResult,
	type PathSpec,
	type PathState,
	type PathTotals,
	type PathWarning,
	type State,
	type StateExtras
} from '../types.ts';
import { fixStateOf } from './fix-state.ts';
import { THROTTLING_NOTE, traceLeg } from './legs.ts';
import { satAtP, satAtT, triplePressure } from './saturation.ts';

/** Most legs in one path. */
export const MAX_LEGS = 50;
/** Relative tolerance for "the path ends where it started" (T and ρ). */
export const CYCLE_TOLERANCE = 1e-6;
function bad(message: string, hint: string): ThermoError {
	return new ThermoError('invalid-path', message, hint);
}

/** Pressure for messages: kPa or MPa, absolute. */
function pa(P: number): string {
	return P >= 1e6 ? `${fmt(P / 1e6)} MPa (absolute)` : `${fmt(P / 1e3)} kPa (absolute)`;
}

/** Temperature for messages: K and °C. */
function kel(T: number): string {
	return `${fmt(T)} K (${fmt(T - 273.15)} °C)`;
}

function positive(name: string, v: unknown, unit: string): number {
	if (typeof v !== 'number' || !Number.isFinite(v) || !(v > 0))
		throw bad(
			`${name} must be a positive number in ${unit} (got ${String(v)}).`,
			`Give ${name} in ${unit}.`
		);
	return v;
}

/**
 * Degrees of superheat or subcooling against saturation at the state's own pressure, and the
 * liquid and vapor volume fractions on and inside the dome: α″ = x·v″/v, α′ = (1 − x)·v′/v.
 */
export function stateExtras(fl: Fluid, st: State): StateExtras {
	const out: StateExtras = {
		Tsat: null,
		superheat: null,
		subcooling: null,
		liquidVolumeFraction: null,
		vaporVolumeFraction: null
	};
	const subcritical = st.P < fl.Pc * (1 - 1e-9) && st.P >= triplePressure(fl) * (1 - 1e-9);
	if (subcritical) {
		const Tsat = st.x !== null ? st.T : satAtP(fl, st.P).T;
		out.Tsat = Tsat;
		if (st.phase === 'superheated-vapor') out.superheat = Math.max(0, st.T - Tsat);
		if (st.phase === 'saturated-vapor') out.superheat = 0;
		if (st.phase === 'compressed-liquid') out.subcooling = Math.max(0, Tsat - st.T);
		if (st.phase === 'saturated-liquid') out.subcooling = 0;
	}
	if (st.x !== null) {
		if (st.phase === 'saturated-liquid') {
			out.liquidVolumeFraction = 1;
			out.vaporVolumeFraction = 0;
		} else if (st.phase === 'saturated-vapor') {
			out.liquidVolumeFraction = 0;
			out.vaporVolumeFraction = 1;
		} else if (st.phase === 'saturated-mixture') {
			const sat = satAtT(fl, st.T);
			const vV = 1 / sat.rhoV;
			const av = Math.min(1, Math.max(0, (st.x * vV) / st.v));
			out.vaporVolumeFraction = av;
			out.liquidVolumeFraction = 1 - av;
		}
	}
	return out;
}

function totalsOf(
	unit: 'J' | 'W',
	m: number,
	q: number,
	w: number,
	wShaft: number,
	qFlow: number
): PathTotals {
	return { unit, Q: m * q, W: m * w, WShaft: m * wShaft, QFlow: m * qFlow };
}

/** Check the spec's shape (the engine's own checks cover the start and each leg). */
function checkSpec(spec: PathSpec): { fl: Fluid; limits: DesignLimits; atm: number } {
	if (typeof spec !== 'object' || spec === null)
		throw bad(
			'A path must be an object { fluid, system, start, legs, limits? }.',
			'Send the path as a JSON object.'
		);
	const fl = getCompiledFluid(spec.fluid);
	const sys = spec.system as unknown as Record<string, unknown>;
	if (typeof sys !== 'object' || sys === null)
		throw bad(
			'The system is missing.',
			'Give system: { kind: "closed", mass } or { kind: "closed", volume } or { kind: "flow", massFlow }.'
		);
	if (sys.kind === 'closed') {
		if (sys.mass !== undefined && sys.volume !== undefined)
			throw bad(
				'Give the closed system’s mass or its volume, not both (the volume fixes the mass through the start state).',
				'Keep one of mass (kg) or volume (m³).'
			);
		if (sys.mass !== undefined) positive('system.mass', sys.mass, 'kg');
		if (sys.volume !== undefined) positive('system.volume', sys.volume, 'm³');
	} else if (sys.kind === 'flow') positive('system.massFlow', sys.massFlow, 'kg/s');
	else
		throw bad(
			`Unknown system kind "${String(sys.kind)}".`,
			'Use "closed" (vessel, piston–cylinder) or "flow" (steady-flow device).'
		);
	if (!Array.isArray(spec.legs) || spec.legs.length === 0)
		throw bad('A path needs at least one leg.', 'Give legs: [{ process, target }, …].');
	if (spec.legs.length > MAX_LEGS)
		throw bad(
			`A path may hold at most ${MAX_LEGS} legs (got ${spec.legs.length}).`,
			`Split the path into sheets of up to ${MAX_LEGS} legs.`
		);
	const ids = new Set<string>();
	spec.legs.forEach((l, i) => {
		if (typeof l !== 'object' || l === null)
			throw bad(`Leg ${i + 1} is not an object.`, 'Give each leg as { process, target, n? }.');
		const id = l.id ?? `L${i + 1}`;
		if (typeof id !== 'string' || id.trim() === '')
			throw bad(`Leg ${i + 1} has an empty or non-text id.`, 'Leave id out or give a short text.');
		if (ids.has(id))
			throw bad(`Two legs have the id "${id}".`, 'Give every leg its own id, or leave ids out.');
		ids.add(id);
	});
	const limits: DesignLimits = {};
	const lim = (spec.limits ?? {}) as Record<string, unknown>;
	if (typeof lim !== 'object' || lim === null)
		throw bad(
			'limits must be an object.',
			'Give limits: { designPressure?, designTemperature?, reliefSetPressure?, minimumTemperature? } in Pa and K.'
		);
	for (const k of Object.keys(lim)) {
		if (!DESIGN_LIMIT_NAMES.includes(k as DesignLimitName))
			throw bad(
				`Unknown design limit "${k}".`,
				`Use ${DESIGN_LIMIT_NAMES.join(', ')} (Pa and K, absolute).`
			);
		if (lim[k] === undefined || lim[k] === null) continue;
		limits[k as DesignLimitName] = positive(
			`limits.${k}`,
			lim[k],
			k.endsWith('Pressure') ? 'Pa (absolute)' : 'K'
		);
	}
	const atm =
		spec.atmosphericPressure === undefined
			? DEFAULT_ATMOSPHERE
			: positive('atmosphericPressure', spec.atmosphericPressure, 'Pa');
	return { fl, limits, atm };
}

/** Compute a whole path (see the module comment and PathSpec/PathResult in types.ts). Throws ThermoError. */
export function computePath(spec: PathSpec): PathResult {
	const { fl, limits, atm } = checkSpec(spec);
	const warnings: PathWarning[] = [];
	const start = fixStateOf(fl, spec.start, {
		hint: spec.startHint,
		near: spec.startNear,
		window: spec.window
	});
	const closed = spec.system.kind === 'closed';
	let m: number;
	let system: PathResult['system'];
	if (spec.system.kind === 'closed') {
		const sys = spec.system;
		m = sys.mass ?? (sys.volume !== undefined ? sys.volume / start.v : 1);
		// a given volume is reported as given (m·v₁ = (V/v₁)·v₁ can miss it by an ulp)
		system = { kind: 'closed', mass: m, volume: sys.volume ?? m * start.v };
		if (sys.mass === undefined && sys.volume === undefined)
			warnings.push({
				code: 'per-kg-totals',
				severity: 'info',
				message: 'No mass or volume is given for this closed system: the totals are for 1 kg.'
			});
	} else {
		m = spec.system.massFlow;
		system = { kind: 'flow', massFlow: m };
	}
	const unit: 'J' | 'W' = closed ? 'J' : 'W';

	const states: PathState[] = [{ id: 'S1', state: start, extras: stateExtras(fl, start) }];
	const legs: PathLeg[] = [];
	const limitEvents: LimitEvent[] = [];
	const per = { q: 0, w: 0, wShaft: 0, qFlow: 0, du: 0, dh: 0, ds: 0 };
	const { beyond, tol } = limitTests(limits);
	limitEvents.push(...startLimitEvents(limits, start));

	let from = start;
	spec.legs.forEach((ls, i) => {
		const id = ls.id ?? `L${i + 1}`;
		const stateId = `S${i + 2}`;
		let trace;
		try {
			trace = traceLeg(
				{
					fluid: fl.id,
					start: { T: from.T, rho: from.rho },
					process: ls.process,
					target: ls.target,
					n: ls.n,
					samples: ls.samples ?? spec.samples,
					window: spec.window,
					endHint: ls.endHint,
					endNear: ls.endNear
				},
				true
			);
		} catch (e) {
			if (e instanceof ThermoError)
				throw new ThermoError(e.code, `Leg ${id} (${String(ls.process)}): ${e.message}`, e.hint, {
					field: `legs[${i}]`,
					candidates: e.candidates
				});
			throw e;
		}
		const leg = trace.leg;
		// the leg starts exactly at the previous state (its own fixState from (T, ρ) may differ in the last bits)
		leg.start = from;
		leg.points[0] = from;
		legs.push({
			id,
			from: states[states.length - 1].id,
			to: stateId,
			leg,
			totals: totalsOf(unit, m, leg.q, leg.w, leg.wShaft, leg.qFlow)
		});
		states.push({ id: stateId, state: leg.end, extras: stateExtras(fl, leg.end) });
		per.q += leg.q;
		per.w += leg.w;
		per.wShaft += leg.wShaft;
		per.qFlow += leg.qFlow;

		// design limits: the first state along the leg where each is reached
		for (const k of DESIGN_LIMIT_NAMES) {
			if (limits[k] === undefined) continue;
			const g = beyond[k];
			const at = trace.firstReach((T, P) => g(T, P) + tol(k));
			if (!at) continue;
			const gEnd = g(leg.end.T, leg.end.P);
			const exceeded = gEnd > tol(k) || leg.points.some((p) => g(p.T, p.P) > tol(k));
			limitEvents.push({
				limit: k,
				value: limits[k] as number,
				leg: id,
				kind: 'reached',
				exceeded,
				state: at
			});
		}

		// liquid-full: a closed system crossing into compressed liquid from the dome, or heating a
		// compressed liquid at constant volume from the leg's start
		if (closed) {
			let full: State | null = null;
			let onset: 'crossing' | 'start' = 'crossing';
			leg.crossings.forEach((c, j) => {
				const [before, after] = trace.sides[j];
				if (!full && c.line === 'saturated-liquid' && before && !after) full = c.state;
			});
			if (!full && trace.endsFromDome && leg.end.phase === 'saturated-liquid') full = leg.end;
			if (
				!full &&
				ls.process === 'isochoric' &&
				leg.start.phase === 'compressed-liquid' &&
				leg.end.T > leg.start.T
			) {
				full = leg.start;
				onset = 'start';
			}
			if (full) {
				const f: State = full;
				const p = evalPoint(fl, f.T, f.rho, new Point(), 2);
				const rate = p.dPdT;
				const known = Number.isFinite(rate) && rate > 0;
				warnings.push({
					code: 'liquid-full',
					severity: 'caution',
					leg: id,
					at: f,
					onset,
					...(known ? { dPdT: rate } : {}),
					message:
						(onset === 'crossing'
							? `Leg ${id} (${ls.process}) fills the closed system with liquid at T = ${kel(f.T)}, P = ${pa(f.P)}: it crosses the saturated-liquid line toward the liquid side. `
							: `Leg ${id} (${ls.process}) heats a liquid-full closed system at constant volume: it starts as compressed liquid at T = ${kel(f.T)}, P = ${pa(f.P)}. `) +
						LIQUID_FULL_CAUTION +
						(known
							? ` Here about ${fmt(rate / 1e6)} MPa per kelvin at constant volume ((∂P/∂T)ᵥ of the liquid).`
							: '')
				});
			} else if (
				ls.process === 'isochoric' &&
				leg.end.phase === 'saturated-mixture' &&
				leg.end.T > leg.start.T &&
				leg.end.rho > fl.rhoc
			) {
				warnings.push({
					code: 'liquid-full-ahead',
					severity: 'info',
					leg: id,
					message: `Leg ${id} heats a closed two-phase system whose mean density (${fmt(leg.end.rho)} kg/m³) is above the critical density (${fmt(fl.rhoc)} kg/m³): heated further, the liquid expands until the vessel is liquid-full, and then the pressure rises very fast.`
				});
			}
		}
		if (ls.process === 'isenthalpic')
			warnings.push({
				code: 'throttling-irreversible',
				severity: 'info',
				leg: id,
				message: `Leg ${id}: ${THROTTLING_NOTE}`
			});
		from = leg.end;
	});
	const end = states[states.length - 1].state;
	per.du = end.u - start.u;
	per.dh = end.h - start.h;
	per.ds = end.s - start.s;

	// warnings for the limit events, and the caution
	warnings.push(...limitWarnings(limitEvents));
	if (
		limits.reliefSetPressure !== undefined &&
		limits.designPressure !== undefined &&
		limits.reliefSetPressure > limits.designPressure
	)
		warnings.push({
			code: 'relief-set-above-design-pressure',
			severity: 'warning',
			message: `The relief set pressure (${pa(limits.reliefSetPressure)}) is above the design pressure (${pa(limits.designPressure)}); relief set pressures and allowable overpressure are governed by the applicable code — check them there.`
		});
	if (Object.keys(limits).length > 0 || limitEvents.length > 0)
		warnings.unshift({
			code: 'pressure-equipment-caution',
			severity: 'caution',
			message: PRESSURE_EQUIPMENT_CAUTION
		});

	// a cycle: back at the start within CYCLE_TOLERANCE
	let cycle: CycleAnalysis | null = null;
	if (
		Math.abs(end.T - start.T) <= CYCLE_TOLERANCE * start.T &&
		Math.abs(end.rho - start.rho) <= CYCLE_TOLERANCE * start.rho &&
		legs.length >= 2
	) {
		cycle = cycleOf(legs, closed, m, unit);
	}
	return {
		fluid: fl.id,
		system,
		atmosphericPressure: atm,
		limits,
		states,
		legs,
		perKg: per,
		totals: totalsOf(unit, m, per.q, per.w, per.wShaft, per.qFlow),
		cycle,
		limitEvents,
		warnings
	};
}

/**
 * How far beyond each design limit a state at (T, P) lies (≥ 0: at or beyond; positive the way the
 * limit is exceeded: above a pressure or design temperature, below the minimum temperature), and
 * the tolerance within which a state counts as at the limit.
 */
export function limitTests(limits: DesignLimits): {
	beyond: Record<DesignLimitName, (T: number, P: number) => number>;
	tol: (k: DesignLimitName) => number;
} {
	return {
		beyond: {
			designPressure: (_T, P) => P - (limits.designPressure as number),
			reliefSetPressure: (_T, P) => P - (limits.reliefSetPressure as number),
			designTemperature: (T) => T - (limits.designTemperature as number),
			minimumTemperature: (T) => (limits.minimumTemperature as number) - T
		},
		tol: (k) => 1e-9 * (limits[k] as number)
	};
}

/** The limits the path's start is already at or beyond, in the order of DESIGN_LIMIT_NAMES. */
export function startLimitEvents(limits: DesignLimits, start: State): LimitEvent[] {
	const { beyond, tol } = limitTests(limits);
	const events: LimitEvent[] = [];
	for (const k of DESIGN_LIMIT_NAMES) {
		if (limits[k] === undefined) continue;
		const g = beyond[k](start.T, start.P);
		if (g >= -tol(k))
			events.push({
				limit: k,
				value: limits[k] as number,
				leg: null,
				kind: 'start-beyond',
				exceeded: g > tol(k),
				state: start
			});
	}
	return events;
}

/** The codes of the warnings limitWarnings gives. */
export const LIMIT_WARNING_CODES: ReadonlySet<PathWarning['code']> = new Set([
	'design-pressure-reached',
	'design-pressure-exceeded',
	'relief-set-pressure-reached',
	'relief-set-pressure-exceeded',
	'design-temperature-reached',
	'design-temperature-exceeded',
	'below-minimum-temperature'
]);

/** One warning per design-limit event, in the events' order, with the event's state. */
export function limitWarnings(limitEvents: readonly LimitEvent[]): PathWarning[] {
	const warnings: PathWarning[] = [];
	for (const ev of limitEvents) {
		const label = DESIGN_LIMIT_LABEL[ev.limit];
		const v = ev.limit.endsWith('Pressure') ? pa(ev.value) : kel(ev.value);
		const where = ev.leg
			? `Leg ${ev.leg} reaches the ${label} (${v})`
			: `The start S1 is already at or beyond the ${label} (${v})`;
		const at = ev.leg ? ` at T = ${kel(ev.state.T)}, P = ${pa(ev.state.P)}` : '';
		if (ev.limit === 'minimumTemperature') {
			warnings.push({
				code: 'below-minimum-temperature',
				severity: 'warning',
				leg: ev.leg ?? undefined,
				at: ev.state,
				message: `${where}${at}${ev.exceeded ? ' and goes below it' : ''}: materials must be rated for it.`
			});
			continue;
		}
		const base =
			ev.limit === 'designPressure'
				? 'design-pressure'
				: ev.limit === 'reliefSetPressure'
					? 'relief-set-pressure'
					: 'design-temperature';
		warnings.push({
			code: `${base}-${ev.exceeded ? 'exceeded' : 'reached'}` as PathWarning['code'],
			severity: 'warning',
			leg: ev.leg ?? undefined,
			at: ev.state,
			message: `${where}${at}${ev.exceeded ? ' and goes beyond it' : ''}.`
		});
	}
	return warnings;
}

/**
 * A closed path's cycle figures from its legs' heat and work per kg (the system's if closed, else
 * the flow's): net work, heat added and rejected, and the thermal efficiency of a power cycle or the
 * COPs of a reverse one, with totals for mass m.
 */
export function cycleOf(
	legs: readonly { leg: { q: number; w: number; wShaft: number; qFlow: number } }[],
	closed: boolean,
	m: number,
	unit: 'J' | 'W'
): CycleAnalysis {
	const qs = legs.map((l) => (closed ? l.leg.q : l.leg.qFlow));
	const netWork = legs.reduce((a, l) => a + (closed ? l.leg.w : l.leg.wShaft), 0);
	const heatAdded = qs.reduce((a, q) => a + Math.max(0, q), 0);
	const heatRejected = qs.reduce((a, q) => a + Math.max(0, -q), 0);
	const scale = Math.max(heatAdded, heatRejected, 1e-300);
	const kind: CycleAnalysis['kind'] =
		Math.abs(netWork) <= 1e-9 * scale ? 'no-net-work' : netWork > 0 ? 'power' : 'reverse';
	return {
		kind,
		netWork,
		heatAdded,
		heatRejected,
		totals: {
			unit,
			netWork: m * netWork,
			heatAdded: m * heatAdded,
			heatRejected: m * heatRejected
		},
		thermalEfficiency: kind === 'power' && heatAdded > 0 ? netWork / heatAdded : null,
		copCooling: kind === 'reverse' ? heatAdded / -netWork : null,
		copHeating: kind === 'reverse' ? heatRejected / -netWork : null
	};
}
