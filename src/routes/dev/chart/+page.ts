import {
	fixState,
	saturationCurve,
	getFluid,
	saturationAtP,
	saturationAtT,
	computeLeg
} from '$lib/thermo';
import type { FluidInfo, Inputs, Process, State } from '$lib/thermo/types';
import type {
	ChartLeg,
	ChartState,
	CurvePoint,
	DesignLimits,
	Isoline,
	MeasuredTrace,
	SaturationCurve
} from '$lib/charts/types';
import type { PageLoad } from './$types';

/**
 * Demo data for the chart bench, computed with the engine (in the browser too, so dragging
 * re-solves the path locally). The scenario is invented: kettle K-2 at a made-up plant is heated
 * sealed, vented and recompressed, one leg of each process kind.
 */

export interface _LegSpec {
	process: Process;
	/** the leg's end: T for isochoric legs, else v (SI) */
	target: { T?: number; v?: number };
	n?: number;
}

export interface _Scenario {
	fluid: string;
	start: Inputs;
	legs: _LegSpec[];
}

export const _SCENARIOS: Record<string, _Scenario> = {
	water: {
		fluid: 'water',
		start: { T: 373.15, x: 0.05 },
		legs: [
			{ process: 'isochoric', target: { T: 573.15 } },
			{ process: 'isothermal', target: { v: 0.25 } },
			{ process: 'isentropic', target: { v: 1.2 } },
			{ process: 'isobaric', target: { v: 0.3 } },
			{ process: 'isenthalpic', target: { v: 0.9 } },
			{ process: 'polytropic', target: { v: 0.15 }, n: 1.25 }
		]
	},
	ammonia: {
		fluid: 'ammonia',
		start: { T: 263.15, x: 0.1 },
		legs: [
			{ process: 'isochoric', target: { T: 313.15 } },
			{ process: 'isothermal', target: { v: 0.2 } },
			{ process: 'isentropic', target: { v: 0.6 } },
			{ process: 'isobaric', target: { v: 0.15 } },
			{ process: 'isenthalpic', target: { v: 0.4 } },
			{ process: 'polytropic', target: { v: 0.08 }, n: 1.2 }
		]
	}
};

const SAMPLES = 40;

function logspace(a: number, b: number, n: number): number[] {
	const la = Math.log(a);
	const lb = Math.log(b);
	return Array.from({ length: n }, (_, i) => Math.exp(la + ((lb - la) * i) / (n - 1)));
}

/** fixState, or null where the engine refuses (outside the fluid's range, a solid, …). */
function tryFix(fluid: string, inputs: Inputs): State | null {
	try {
		return fixState(fluid, inputs);
	} catch {
		return null;
	}
}

function isWet(s: State) {
	return s.phase === 'saturated-mixture';
}

/** One leg from the engine, starting at the previous state. */
function legOf(fluid: string, start: State, spec: _LegSpec) {
	const target = spec.process === 'isochoric' ? { T: spec.target.T! } : { v: spec.target.v! };
	const leg = computeLeg({
		fluid,
		start: { T: start.T, v: start.v },
		process: spec.process,
		target,
		n: spec.n,
		samples: SAMPLES
	});
	return { points: leg.points, end: leg.end, crossings: leg.crossings };
}

const legCache = new Map<string, ReturnType<typeof legOf>>();

function cachedLeg(fluid: string, start: State, spec: _LegSpec) {
	const key = JSON.stringify([fluid, start.T, start.v, spec]);
	let leg = legCache.get(key);
	if (!leg) {
		leg = legOf(fluid, start, spec);
		if (legCache.size > 400) legCache.clear();
		legCache.set(key, leg);
	}
	return leg;
}

export { tryFix as _fix };

export function _computePath(
	scn: _Scenario,
	labels = true
): { states: ChartState[]; legs: ChartLeg[] } {
	const first = tryFix(scn.fluid, scn.start);
	if (!first) throw new Error('The start state cannot be fixed there.');
	const states: ChartState[] = [{ id: 's1', label: labels ? 'S1' : '', state: first }];
	const legs: ChartLeg[] = [];
	let cur = first;
	scn.legs.forEach((spec, i) => {
		const { points, end, crossings } = cachedLeg(scn.fluid, cur, spec);
		const id = `s${i + 2}`;
		legs.push({
			id: `l${i + 1}`,
			process: spec.process,
			points,
			crossings,
			from: states[i].id,
			to: id,
			n: spec.n
		});
		states.push({ id, label: `S${i + 2}`, state: end });
		cur = end;
	});
	return { states, legs };
}

function curvePoint(s: State): CurvePoint {
	return { T: s.T, P: s.P, v: s.v };
}

/** An isobar across the chart: sampled in v, with its saturation corners inserted exactly. */
export function _isobar(info: FluidInfo, P: number, vRange: [number, number]): Isoline {
	const pts: State[] = [];
	const T0 = info.triple.T * (1 + 1e-6);
	for (let i = 0; i < 90; i++) {
		const T = T0 * (info.limits.Tmax / T0) ** (i / 89);
		const s = tryFix(info.id, { T, P });
		if (s && s.v >= vRange[0] && s.v <= vRange[1]) pts.push(s);
	}
	if (P < info.critical.P) {
		try {
			const sat = saturationAtP(info.id, P);
			pts.push(sat.liquid, sat.vapor);
		} catch {
			// outside saturation range: the sampled points suffice
		}
	}
	pts.sort((a, b) => a.v - b.v);
	return { kind: 'isobar', value: P, points: pts.map(curvePoint) };
}

/** An isotherm across the chart, likewise. */
export function _isotherm(info: FluidInfo, T: number, vRange: [number, number]): Isoline {
	const pts: State[] = [];
	for (const v of logspace(vRange[0], vRange[1], 90)) {
		const s = tryFix(info.id, { T, v });
		if (s && s.P <= info.limits.Pmax) pts.push(s);
	}
	if (T < info.critical.T) {
		try {
			const sat = saturationAtT(info.id, T);
			pts.push(sat.liquid, sat.vapor);
		} catch {
			// as above
		}
	}
	pts.sort((a, b) => a.v - b.v);
	return { kind: 'isotherm', value: T, points: pts.map(curvePoint) };
}

export interface _Demo {
	info: FluidInfo;
	saturation: SaturationCurve;
	isobars: Isoline[];
	isotherms: Isoline[];
	limits: DesignLimits;
	traces: MeasuredTrace[];
}

const DEMO_LEVELS: Record<
	string,
	{ P: number[]; T: number[]; limits: { dp: number; rsp: number; dt: number; mt: number } }
> = {
	water: {
		P: [2e3, 2e4, 2e5, 2e6, 20e6],
		T: [323.15, 373.15, 423.15, 473.15, 523.15, 573.15, 623.15],
		limits: { dp: 1.6e6, rsp: 1.45e6, dt: 523.15, mt: 278.15 }
	},
	ammonia: {
		P: [5e4, 2e5, 1e6, 5e6],
		T: [233.15, 263.15, 293.15, 323.15, 353.15],
		limits: { dp: 2.0e6, rsp: 1.8e6, dt: 343.15, mt: 233.15 }
	}
};

/** Fluid, dome, background lines, invented design limits (gauge values for a site at 101.325 kPa) and an invented logger trace. */
export function _demo(fluid: string, path: { legs: ChartLeg[] }): _Demo {
	const info = getFluid(fluid);
	const saturation = saturationCurve(fluid, 80);
	const vRange: [number, number] = [saturation.liquid[0].v * 0.9, saturation.vapor[0].v * 1.2];
	const lv = DEMO_LEVELS[fluid];
	const atm = 101325;
	const limits: DesignLimits = {
		designPressure: {
			value: lv.limits.dp + atm,
			points: _isobar(info, lv.limits.dp + atm, vRange).points
		},
		reliefSetPressure: {
			value: lv.limits.rsp + atm,
			points: _isobar(info, lv.limits.rsp + atm, vRange).points
		},
		designTemperature: {
			value: lv.limits.dt,
			points: _isotherm(info, lv.limits.dt, vRange).points
		},
		minimumTemperature: {
			value: lv.limits.mt,
			points: _isotherm(info, lv.limits.mt, vRange).points
		}
	};
	// a logger on the kettle during the sealed heat-up: T and P with a little noise, v filled in by the engine
	let seed = 7;
	const noise = () => ((seed = (seed * 16807) % 2147483647) / 2147483647 - 0.5) * 2;
	const heat = path.legs[0]?.points ?? [];
	const traces: MeasuredTrace[] = [
		{
			id: 'logger-1',
			label: 'TT-201 / PT-201',
			points: heat
				.filter((_, i) => i % 2 === 0)
				.map((p) => {
					const T = p.T + noise() * 1.5;
					const v = p.v * (1 + noise() * 0.04);
					const s = tryFix(fluid, { T, v });
					return s ? { T: s.T, P: s.P, v: s.v, inDome: isWet(s) } : { T, P: p.P, v: null };
				})
		}
	];
	return {
		info,
		saturation,
		isobars: lv.P.map((P) => _isobar(info, P, vRange)),
		isotherms: lv.T.map((T) => _isotherm(info, T, vRange)),
		limits,
		traces
	};
}

export const load: PageLoad = () => ({});
