import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/iapws-legs.json';
import liquidFull from '../../../../tests/reference/iapws-liquid-full.json';
import {
	LIQUID_FULL_CAUTION,
	PRESSURE_EQUIPMENT_CAUTION,
	ThermoError,
	computeLeg,
	computePath,
	fixState,
	saturationAtT,
	stateExtras,
	type PathSpec
} from '../index.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function thrown(fn: () => unknown): ThermoError {
	try {
		fn();
	} catch (e) {
		if (e instanceof ThermoError) return e;
		throw e;
	}
	throw new Error('expected a ThermoError');
}

/** An invented sealed hot-water vessel: 0.5 m³, 120 °C, nearly liquid-full, heated in a fire case. */
const VESSEL: PathSpec = {
	fluid: 'water',
	system: { kind: 'closed', volume: 0.5 },
	start: { T: 393.15, x: 1e-4 },
	legs: [{ id: 'fire-heating', process: 'isochoric', target: { T: 493.15 } }],
	limits: {
		designPressure: 1.6e6,
		reliefSetPressure: 1.5e6,
		designTemperature: 473.15,
		minimumTemperature: 263.15
	}
};

const cases = (
	fixture as unknown as {
		cases: { name: string; crossings: { T: number; P: number }[]; end: { T: number; P: number } }[];
	}
).cases;

describe('computePath: the sealed vessel heated until liquid-full', () => {
	const r = computePath(VESSEL);
	// python3-iapws 1.5.2 (Debian), IAPWS95: the same leg, 'isochoric to liquid-full' in iapws-legs.json
	const ref = cases.find((c) => c.name === 'isochoric to liquid-full')!;

	it('fixes the mass from the volume and the start (m = V / v₁) and scales the totals', () => {
		const v1 = r.states[0].state.v;
		expect(r.system).toEqual({ kind: 'closed', mass: 0.5 / v1, volume: 0.5 });
		const leg = r.legs[0];
		expect(leg.totals.unit).toBe('J');
		expect(leg.totals.Q).toBeCloseTo((0.5 / v1) * leg.leg.q, 6);
		expect(leg.totals.W).toBe(0);
		expect(r.totals.Q).toBeCloseTo(leg.totals.Q, 6);
		expect(r.states.map((s) => s.id)).toEqual(['S1', 'S2']);
		expect(leg.from).toBe('S1');
		expect(leg.to).toBe('S2');
	});

	it('reports the crossing and the liquid-full warning at it', () => {
		const c = r.legs[0].leg.crossings;
		expect(c).toHaveLength(1);
		expect(c[0].line).toBe('saturated-liquid');
		expect(rel(c[0].state.T, ref.crossings[0].T)).toBeLessThan(1e-8);
		expect(rel(r.states[1].state.P, ref.end.P)).toBeLessThan(1e-7);
		const w = r.warnings.find((x) => x.code === 'liquid-full');
		expect(w?.severity).toBe('caution');
		expect(w?.leg).toBe('fire-heating');
		expect(w?.at).toBe(c[0].state);
		expect(w?.message).toMatch(/pressure very fast/);
		expect(w?.message).toMatch(/MPa per kelvin/);
		expect(w?.onset).toBe('crossing');
		expect(w?.dPdT).toBeGreaterThan(0);
	});

	it('finds each design limit exactly at the first state along the leg where it is reached', () => {
		const byLimit = Object.fromEntries(r.limitEvents.map((e) => [e.limit, e]));
		expect(Object.keys(byLimit).sort()).toEqual([
			'designPressure',
			'designTemperature',
			'reliefSetPressure'
		]);
		for (const k of ['designPressure', 'reliefSetPressure'] as const) {
			const e = byLimit[k];
			expect(e.kind).toBe('reached');
			expect(e.exceeded).toBe(true);
			expect(rel(e.state.P, e.value)).toBeLessThan(1e-8);
			// on the leg: same specific volume; and first: every point before it is below the limit
			expect(rel(e.state.v, r.states[0].state.v)).toBeLessThan(1e-9);
			const pts = r.legs[0].leg.points;
			const before = pts.filter((p) => p.T < e.state.T);
			expect(before.every((p) => p.P < e.value)).toBe(true);
		}
		expect(rel(byLimit.designTemperature.state.T, 473.15)).toBeLessThan(1e-8);
		// relief set pressure is met before the design pressure while heating
		expect(byLimit.reliefSetPressure.state.T).toBeLessThan(byLimit.designPressure.state.T);
		const codes = r.warnings.map((w) => w.code);
		expect(codes).toEqual(
			expect.arrayContaining([
				'pressure-equipment-caution',
				'design-pressure-exceeded',
				'relief-set-pressure-exceeded',
				'design-temperature-exceeded'
			])
		);
		expect(codes).not.toContain('below-minimum-temperature');
	});

	it('carries the brief’s code-deferral caution, word for word', () => {
		const c = r.warnings.find((w) => w.code === 'pressure-equipment-caution');
		expect(c?.message).toBe(PRESSURE_EQUIPMENT_CAUTION);
		expect(c?.message).toMatch(/ASME BPVC Section VIII or EN 13445/);
		expect(c?.message).toMatch(/never relief sizes/);
	});

	it('is not a cycle', () => expect(r.cycle).toBeNull());
});

describe('computePath: a vessel that starts liquid-full', () => {
	// python3-iapws 1.5.2 (Debian), IAPWS95: tests/reference/make-iapws-liquid-full.py — start density from
	// the library's (T, P) call, (∂P/∂T)ᵥ from its derivative and a central difference, end from (T, ρ)
	for (const c of liquidFull.cases) {
		it(`warns when a sealed vessel of liquid water is heated: ${c.name}`, () => {
			const r = computePath({
				fluid: 'water',
				system: { kind: 'closed', volume: 0.05 },
				start: { T: c.start.T, P: c.start.P },
				legs: [{ id: 'heat', process: 'isochoric', target: { T: c.end.T } }]
			});
			expect(rel(r.states[0].state.rho, c.start.rho)).toBeLessThan(1e-9);
			expect(rel(r.states[1].state.P, c.end.P)).toBeLessThan(1e-7);
			const w = r.warnings.find((x) => x.code === 'liquid-full');
			expect(w).toBeDefined();
			expect(w?.severity).toBe('caution');
			expect(w?.onset).toBe('start');
			expect(w?.leg).toBe('heat');
			expect(w?.at).toBe(r.states[0].state);
			expect(rel(w!.dPdT!, c.dPdT_v)).toBeLessThan(1e-7);
			expect(w?.message).toMatch(/about [\d.]+ MPa per kelvin at constant volume/);
			expect(w?.message).toMatch(/starts as compressed liquid/);
			expect(w?.message).toContain(LIQUID_FULL_CAUTION);
			// no design limits set: the liquid-full caution is there regardless
			expect(r.limitEvents).toEqual([]);
		});
	}
	it('says nothing for a liquid cooled at constant volume, or heated at constant pressure', () => {
		const c = liquidFull.cases[0];
		const cooled = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: c.end.T, P: 2e6 },
			legs: [{ process: 'isochoric', target: { T: c.start.T } }]
		});
		expect(cooled.warnings.map((w) => w.code)).not.toContain('liquid-full');
		const isobaric = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: c.start.T, P: c.start.P },
			legs: [{ process: 'isobaric', target: { T: c.end.T } }]
		});
		expect(isobaric.warnings.map((w) => w.code)).not.toContain('liquid-full');
	});
	it('warns on a later leg that heats the liquid left by an earlier one', () => {
		const r = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 293.15, P: 101325 },
			legs: [
				{ id: 'press', process: 'isothermal', target: { P: 5e6 } },
				{ id: 'heat', process: 'isochoric', target: { T: 303.15 } }
			]
		});
		const w = r.warnings.filter((x) => x.code === 'liquid-full');
		expect(w.map((x) => x.leg)).toEqual(['heat']);
		expect(w[0].at).toBe(r.states[1].state);
	});
});

describe('computePath: cycles', () => {
	// an invented ammonia chiller: evaporating at −10 °C, condensing at 1.2 MPa
	const chiller = computePath({
		fluid: 'ammonia',
		system: { kind: 'flow', massFlow: 0.1 },
		start: { T: 263.15, x: 1 },
		legs: [
			{ id: 'compressor', process: 'isentropic', target: { P: 1.2e6 } },
			{ id: 'condenser', process: 'isobaric', target: { x: 0 } },
			{ id: 'valve', process: 'isenthalpic', target: { T: 263.15 } },
			{ id: 'evaporator', process: 'isobaric', target: { x: 1 } }
		]
	});
	it('closes, and reports a reverse cycle with COP heating = COP cooling + 1', () => {
		const c = chiller.cycle!;
		expect(c.kind).toBe('reverse');
		// first law over a cycle: net work = heat added − heat rejected
		expect(Math.abs(c.netWork - (c.heatAdded - c.heatRejected))).toBeLessThan(
			1e-6 * c.heatRejected
		);
		expect(Math.abs((c.copHeating as number) - (c.copCooling as number) - 1)).toBeLessThan(1e-9);
		// second law: below the Carnot COP between the evaporating and condensing temperatures
		const Tc = chiller.states[2].state.T,
			Te = 263.15;
		expect(c.copCooling as number).toBeLessThan(Te / (Tc - Te));
		expect(c.copCooling as number).toBeGreaterThan(0.5 * (Te / (Tc - Te)));
		expect(c.totals.unit).toBe('W');
		expect(c.totals.netWork).toBeCloseTo(0.1 * c.netWork, 6);
		expect(c.thermalEfficiency).toBeNull();
	});
	it('matches the python3-iapws compressor discharge and valve outlet', () => {
		// python3-iapws 1.5.2 (Debian), ammonia.NH3: 'isentropic compressor' and 'expansion valve'
		const comp = cases.find((c) => c.name === 'isentropic compressor')!;
		const valve = cases.find((c) => c.name === 'expansion valve')!;
		expect(rel(chiller.states[1].state.T, comp.end.T)).toBeLessThan(1e-7);
		// the valve's inlet here is the condenser outlet at 1.2 MPa (not the fixture's 304 K), so only its outlet T and P
		expect(rel(chiller.states[3].state.T, valve.end.T)).toBeLessThan(1e-9);
		expect(rel(chiller.states[3].state.P, valve.end.P)).toBeLessThan(1e-7);
		expect(chiller.warnings.map((w) => w.code)).toContain('throttling-irreversible');
		// said in words, not in the engine's field names
		const throttling = chiller.warnings.find((w) => w.code === 'throttling-irreversible')!.message;
		expect(throttling).toMatch(/heat and work \(boundary and shaft\) are reported as 0/);
		expect(throttling).not.toMatch(/\b(wShaft|qFlow|q, w)\b/);
		expect(chiller.states[1].extras.superheat).toBeGreaterThan(0);
		expect(chiller.states[2].extras.subcooling).toBe(0);
	});
	// an invented steam plant: 10 MPa, 550 °C, condensing at 40 °C
	const plant = computePath({
		fluid: 'water',
		system: { kind: 'flow', massFlow: 10 },
		start: { T: 313.15, x: 0 },
		legs: [
			{ process: 'isentropic', target: { P: 1e7 } },
			{ process: 'isobaric', target: { T: 823.15 } },
			{ process: 'isentropic', target: { T: 313.15 } },
			{ process: 'isobaric', target: { x: 0 } }
		]
	});
	it('reports a power cycle below the Carnot efficiency', () => {
		const c = plant.cycle!;
		expect(c.kind).toBe('power');
		expect(Math.abs(c.netWork - (c.heatAdded - c.heatRejected))).toBeLessThan(1e-6 * c.heatAdded);
		expect(c.thermalEfficiency as number).toBeLessThan(1 - 313.15 / 823.15);
		expect(c.thermalEfficiency as number).toBeGreaterThan(0.3);
		expect(plant.legs.map((l) => l.id)).toEqual(['L1', 'L2', 'L3', 'L4']);
		expect(plant.totals.unit).toBe('W');
	});
	it('is not a cycle when the end misses the start', () => {
		const open = computePath({
			fluid: 'water',
			system: { kind: 'flow', massFlow: 1 },
			start: { T: 313.15, x: 0 },
			legs: [
				{ process: 'isentropic', target: { P: 1e7 } },
				{ process: 'isobaric', target: { T: 500 } }
			]
		});
		expect(open.cycle).toBeNull();
	});
});

describe('computePath: warnings and extras', () => {
	it('warns below the minimum temperature, at the exact state', () => {
		const r = computePath({
			fluid: 'ammonia',
			system: { kind: 'closed', mass: 20 },
			start: { T: 300, x: 0.5 },
			legs: [{ process: 'isentropic', target: { T: 230 } }],
			limits: { minimumTemperature: 243.15 }
		});
		const e = r.limitEvents[0];
		expect(e.limit).toBe('minimumTemperature');
		expect(rel(e.state.T, 243.15)).toBeLessThan(1e-8);
		expect(r.warnings.map((w) => w.code)).toEqual(
			expect.arrayContaining(['below-minimum-temperature', 'pressure-equipment-caution'])
		);
	});
	it('notes a start already beyond a limit, a relief set above design, per-kg totals and liquid-full ahead', () => {
		const r = computePath({
			fluid: 'water',
			system: { kind: 'closed' },
			start: { T: 400, x: 0.001 },
			legs: [{ process: 'isochoric', target: { T: 420 } }],
			limits: { designPressure: 1e5, reliefSetPressure: 2e5 }
		});
		expect(r.limitEvents.find((e) => e.kind === 'start-beyond')?.limit).toBe('designPressure');
		const codes = r.warnings.map((w) => w.code);
		expect(codes).toEqual(
			expect.arrayContaining([
				'relief-set-above-design-pressure',
				'per-kg-totals',
				'liquid-full-ahead',
				'design-pressure-exceeded'
			])
		);
		expect(r.system).toMatchObject({ kind: 'closed', mass: 1 });
	});
	it('gives no caution when the path has no design limits and reaches none', () => {
		const r = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 2 },
			start: { T: 300, P: 1e5 },
			legs: [{ process: 'isobaric', target: { T: 350 } }]
		});
		expect(r.warnings).toEqual([]);
		expect(r.limitEvents).toEqual([]);
		expect(r.totals.Q).toBeCloseTo(2 * r.legs[0].leg.q, 6);
	});
	it('computes superheat, subcooling and volume fractions like python3-iapws', () => {
		// python3-iapws 1.5.2 (Debian): Tsat by bisection of (T, x = 0) calls, fractions from (T, x) calls
		for (const ex of (
			fixture as unknown as {
				extras: {
					fluid: string;
					inputs: Record<string, number>;
					Tsat: number;
					vaporVolumeFraction?: number;
					liquidVolumeFraction?: number;
				}[];
			}
		).extras) {
			const st = fixState(ex.fluid, ex.inputs);
			const e = stateExtras(st);
			expect(rel(e.Tsat as number, ex.Tsat)).toBeLessThan(1e-9);
			if (st.phase === 'superheated-vapor')
				expect(Math.abs((e.superheat as number) - (st.T - ex.Tsat))).toBeLessThan(1e-6);
			if (st.phase === 'compressed-liquid')
				expect(Math.abs((e.subcooling as number) - (ex.Tsat - st.T))).toBeLessThan(1e-6);
			if (ex.vaporVolumeFraction !== undefined) {
				expect(Math.abs((e.vaporVolumeFraction as number) - ex.vaporVolumeFraction)).toBeLessThan(
					1e-7
				);
				expect(
					Math.abs((e.liquidVolumeFraction as number) - (ex.liquidVolumeFraction as number))
				).toBeLessThan(1e-7);
			} else expect(e.vaporVolumeFraction).toBeNull();
		}
		// above the critical pressure neither superheat nor subcooling means anything
		const e = stateExtras(fixState('water', { T: 500, P: 3e7 }));
		expect([e.Tsat, e.superheat, e.subcooling]).toEqual([null, null, null]);
		const sat = saturationAtT('water', 400);
		expect(stateExtras(sat.liquid)).toMatchObject({
			subcooling: 0,
			liquidVolumeFraction: 1,
			vaporVolumeFraction: 0
		});
		expect(stateExtras(sat.vapor)).toMatchObject({
			superheat: 0,
			liquidVolumeFraction: 0,
			vaporVolumeFraction: 1
		});
	});
	it('chains legs: each leg starts at the previous state', () => {
		const r = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 300, P: 1e5 },
			legs: [
				{ process: 'isobaric', target: { T: 400 } },
				{ process: 'isochoric', target: { T: 500 } }
			]
		});
		expect(r.legs[1].leg.start).toBe(r.states[1].state);
		const direct = computeLeg({
			fluid: 'water',
			start: { T: 400, P: 1e5 },
			process: 'isochoric',
			target: { T: 500 }
		});
		expect(rel(r.states[2].state.P, direct.end.P)).toBeLessThan(1e-9);
	});
});

describe('computePath: refusals', () => {
	const ok: PathSpec = {
		fluid: 'water',
		system: { kind: 'closed', mass: 1 },
		start: { T: 300, P: 1e5 },
		legs: [{ process: 'isobaric', target: { T: 400 } }]
	};
	it.each([
		[{ system: { kind: 'closed', mass: 1, volume: 2 } }, 'invalid-path', /not both/],
		[{ system: { kind: 'closed', mass: -1 } }, 'invalid-path', /positive/],
		[{ system: { kind: 'flow' } }, 'invalid-path', /massFlow/],
		[{ system: { kind: 'open' } }, 'invalid-path', /Unknown system kind/],
		[{ legs: [] }, 'invalid-path', /at least one leg/],
		[
			{ legs: new Array(51).fill({ process: 'isobaric', target: { T: 400 } }) },
			'invalid-path',
			/at most 50/
		],
		[
			{
				legs: [
					{ id: 'a', process: 'isobaric', target: { T: 400 } },
					{ id: 'a', process: 'isobaric', target: { T: 450 } }
				]
			},
			'invalid-path',
			/Two legs/
		],
		[{ limits: { designPressure: -5 } }, 'invalid-path', /positive/],
		[{ limits: { burstPressure: 5e6 } }, 'invalid-path', /Unknown design limit/],
		[{ atmosphericPressure: 0 }, 'invalid-path', /positive/],
		[{ legs: [{ process: 'isobaric', target: { P: 2e5 } }] }, 'target-is-invariant', /Leg L1/],
		[
			{
				legs: [
					{ process: 'isobaric', target: { T: 400 } },
					{ process: 'isobaric', target: { T: 100 } }
				]
			},
			'unreachable-target',
			/Leg L2/
		],
		[{ fluid: 'helium-3' }, 'unknown-fluid', /helium-3/]
	])('refuses %j', (patch, code, msg) => {
		const e = thrown(() => computePath({ ...ok, ...(patch as Partial<PathSpec>) } as PathSpec));
		expect(e.code).toBe(code);
		expect(e.message).toMatch(msg);
	});
});
