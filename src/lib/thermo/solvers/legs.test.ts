import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/iapws-legs.json';
import {
	ThermoError,
	computeLeg,
	fixState,
	saturationAtP,
	saturationAtT,
	type Leg,
	type LegSpec,
	type Process,
	type State
} from '../index.ts';

interface Rec {
	T: number;
	P: number;
	rho: number;
	v: number;
	u: number;
	h: number;
	s: number;
	x: number | null;
}
interface Case {
	fluid: string;
	name: string;
	start: Record<string, number>;
	process: Process;
	target: Record<string, number>;
	n?: number;
	startState: Rec;
	end: Rec;
	crossings: { line: string; T: number; P: number; rho: number }[];
}

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

// python3-iapws 1.5.2 (Debian): IAPWS95 and ammonia.NH3 end states and crossings from direct
// (T, rho), (T, P) and (T, x) calls, bracketed by bisection (tests/reference/make-iapws-legs.py)
describe('legs against python3-iapws end states (tests/reference/iapws-legs.json)', () => {
	for (const c of (fixture as unknown as { cases: Case[] }).cases) {
		it(`${c.fluid}: ${c.name}`, () => {
			const leg = computeLeg({
				fluid: c.fluid,
				start: c.start,
				process: c.process,
				target: c.target,
				n: c.n
			});
			const e = leg.end;
			expect(rel(e.T, c.end.T)).toBeLessThan(1e-7);
			expect(rel(e.P, c.end.P)).toBeLessThan(2e-7);
			expect(rel(e.rho, c.end.rho)).toBeLessThan(2e-7);
			if (c.end.x === null) expect(e.x === null || e.x === 0 || e.x === 1).toBe(true);
			else expect(Math.abs((e.x as number) - c.end.x)).toBeLessThan(1e-7);
			// differences are free of the energy conventions
			const st = leg.start;
			const scaleE = 1e3 * Math.max(1, Math.abs(c.end.h - c.startState.h));
			expect(Math.abs(e.h - st.h - (c.end.h - c.startState.h))).toBeLessThan(1e-6 * scaleE);
			expect(Math.abs(e.u - st.u - (c.end.u - c.startState.u))).toBeLessThan(1e-6 * scaleE);
			expect(Math.abs(e.s - st.s - (c.end.s - c.startState.s))).toBeLessThan(
				1e-6 * Math.max(1e3, Math.abs(c.end.s - c.startState.s))
			);
			expect(leg.crossings.map((k) => k.line)).toEqual(c.crossings.map((k) => k.line));
			leg.crossings.forEach((k, i) => {
				const ref = c.crossings[i];
				expect(rel(k.state.T, ref.T)).toBeLessThan(1e-8);
				expect(rel(k.state.P, ref.P)).toBeLessThan(1e-7);
				expect(rel(k.state.rho, ref.rho)).toBeLessThan(1e-7);
				expect(k.state.phase).toBe(k.line);
			});
		});
	}
});

/** A table of legs across fluids, processes and phases for the identity and shape checks. */
const TABLE: LegSpec[] = [
	{ fluid: 'water', start: { T: 300, P: 101325 }, process: 'isobaric', target: { T: 500 } },
	{ fluid: 'water', start: { T: 700, P: 5e6 }, process: 'isobaric', target: { x: 0.2 } },
	{ fluid: 'water', start: { T: 600, P: 3e7 }, process: 'isobaric', target: { T: 900 } },
	{ fluid: 'water', start: { T: 393.15, x: 1e-4 }, process: 'isochoric', target: { T: 493.15 } },
	{ fluid: 'water', start: { T: 400, x: 0.5 }, process: 'isochoric', target: { P: 1e6 } },
	{ fluid: 'water', start: { T: 450, x: 0.5 }, process: 'isothermal', target: { P: 1e7 } },
	{ fluid: 'water', start: { T: 450, x: 0.5 }, process: 'isothermal', target: { P: 1e4 } },
	{ fluid: 'water', start: { T: 620, P: 1e5 }, process: 'isothermal', target: { P: 1e8 } },
	{ fluid: 'water', start: { T: 700, P: 1e5 }, process: 'isothermal', target: { v: 0.002 } },
	{ fluid: 'water', start: { T: 800, P: 1e7 }, process: 'isentropic', target: { P: 1e4 } },
	{ fluid: 'water', start: { T: 373, x: 0.1 }, process: 'isentropic', target: { P: 2e7 } },
	{ fluid: 'water', start: { T: 647.096, rho: 322 }, process: 'isentropic', target: { P: 1e5 } },
	{ fluid: 'water', start: { T: 500, P: 3e6 }, process: 'isenthalpic', target: { P: 1e5 } },
	{ fluid: 'water', start: { T: 400, P: 1e5 }, process: 'polytropic', n: 1.3, target: { P: 1e7 } },
	{ fluid: 'water', start: { T: 400, x: 0.2 }, process: 'polytropic', n: 1.1, target: { P: 1e6 } },
	{ fluid: 'water', start: { T: 400, P: 1e5 }, process: 'polytropic', n: 1, target: { v: 0.5 } },
	{
		fluid: 'water',
		start: { T: 300, P: 1e5 },
		process: 'polytropic',
		n: -0.5,
		target: { v: 0.01 }
	},
	{ fluid: 'ammonia', start: { T: 250, P: 4e5 }, process: 'isobaric', target: { T: 320 } },
	{ fluid: 'ammonia', start: { T: 263.15, x: 1 }, process: 'isentropic', target: { P: 1.2e6 } },
	{ fluid: 'ammonia', start: { T: 300, x: 0.05 }, process: 'isochoric', target: { T: 400 } },
	{ fluid: 'ammonia', start: { T: 300, P: 2e5 }, process: 'isothermal', target: { v: 0.01 } },
	{ fluid: 'carbon-dioxide', start: { T: 250, x: 0.3 }, process: 'isothermal', target: { P: 6e6 } },
	{ fluid: 'carbon-dioxide', start: { T: 320, P: 1e7 }, process: 'isentropic', target: { P: 2e6 } },
	{ fluid: 'r134a', start: { T: 320, x: 1 }, process: 'isentropic', target: { P: 2e5 } },
	{
		fluid: 'r134a',
		start: { T: 250, x: 0.5 },
		process: 'polytropic',
		n: 1.15,
		target: { P: 1.5e6 }
	},
	{ fluid: 'nitrogen', start: { T: 77, x: 0.5 }, process: 'isenthalpic', target: { P: 5e4 } },
	{ fluid: 'nitrogen', start: { T: 90, x: 0.02 }, process: 'isochoric', target: { T: 200 } }
];

function label(s: LegSpec): string {
	return `${s.fluid} ${s.process}${s.n !== undefined ? ` n=${s.n}` : ''} from ${JSON.stringify(s.start)} to ${JSON.stringify(s.target)}`;
}

/** The quantity that changes monotonically along each process (h on isobars: T is flat in the dome). */
function progress(process: Process, p: State): number {
	return process === 'isobaric'
		? p.h
		: process === 'isochoric'
			? p.u
			: process === 'isenthalpic'
				? p.P
				: p.v;
}

describe('leg integrals against the exact identities (1e-6 relative)', () => {
	const legs = TABLE.map((s) => [s, computeLeg(s)] as const);
	for (const [s, leg] of legs) {
		it(label(s), () => {
			const scale = Math.max(
				Math.abs(leg.q),
				Math.abs(leg.w),
				Math.abs(leg.du),
				Math.abs(leg.dh),
				1
			);
			// first law forms, both kinds (throttling reports zeros instead: it is irreversible)
			if (s.process !== 'isenthalpic') {
				expect(Math.abs(leg.q - (leg.du + leg.w))).toBeLessThan(1e-9 * scale);
				expect(Math.abs(leg.qFlow - (leg.dh + leg.wShaft))).toBeLessThan(1e-9 * scale);
			}
			const { start: a, end: b } = leg;
			switch (s.process) {
				case 'isobaric': // w = PΔv, no shaft work at constant P
					expect(Math.abs(leg.w - a.P * (b.v - a.v))).toBeLessThan(1e-6 * scale);
					expect(leg.wShaft).toBe(0);
					expect(Math.abs(leg.q - leg.dh)).toBeLessThan(1e-6 * scale);
					break;
				case 'isochoric': // w = 0, wShaft = −vΔP
					expect(leg.w).toBe(0);
					expect(Math.abs(leg.wShaft + a.v * (b.P - a.P))).toBeLessThan(1e-6 * scale);
					break;
				case 'isothermal': // reversible heat q = TΔs, in both closed and flow forms
					expect(Math.abs(leg.q - a.T * leg.ds)).toBeLessThan(1e-6 * scale);
					expect(Math.abs(leg.qFlow - a.T * leg.ds)).toBeLessThan(1e-6 * scale);
					break;
				case 'isentropic': // q = 0: w = −Δu, wShaft = −Δh
					expect(Math.abs(leg.ds)).toBeLessThan(1e-9 * Math.max(1, Math.abs(a.s)));
					expect(Math.abs(leg.q)).toBeLessThan(1e-6 * scale);
					expect(Math.abs(leg.qFlow)).toBeLessThan(1e-6 * scale);
					break;
				case 'isenthalpic': // throttling: all four zero, with the note
					expect([leg.q, leg.w, leg.wShaft, leg.qFlow]).toEqual([0, 0, 0, 0]);
					expect(Math.abs(leg.dh)).toBeLessThan(1e-9 * Math.max(1e5, Math.abs(a.h)));
					expect(leg.ds).toBeGreaterThan(0);
					expect(leg.notes?.join(' ')).toMatch(/irreversible/);
					break;
				case 'polytropic': {
					const n = s.n as number;
					const w = n === 1 ? a.P * a.v * Math.log(b.v / a.v) : (b.P * b.v - a.P * a.v) / (1 - n);
					expect(Math.abs(leg.w - w)).toBeLessThan(1e-6 * Math.max(Math.abs(w), 1));
					// −∫v dP = n·∫P dv along P·vⁿ = const
					expect(Math.abs(leg.wShaft - n * leg.w)).toBeLessThan(
						1e-6 * Math.max(Math.abs(leg.w), 1)
					);
					break;
				}
			}
		});
	}
});

describe('leg shape: points, crossings, invariants', () => {
	const legs = TABLE.map((s) => [s, computeLeg({ ...s, samples: 60 })] as const);
	for (const [s, leg] of legs) {
		it(label(s), () => {
			expect(leg.points.length).toBeGreaterThanOrEqual(60);
			expect(leg.points[0]).toBe(leg.start);
			expect(leg.points[leg.points.length - 1]).toBe(leg.end);
			for (const p of leg.points)
				for (const k of ['T', 'P', 'v', 'rho', 'u', 'h', 's'] as const)
					expect(Number.isFinite(p[k])).toBe(true);
			// monotone along the leg
			const prog = leg.points.map((p) => progress(s.process, p));
			const dir = Math.sign(prog[prog.length - 1] - prog[0]);
			for (let i = 1; i < prog.length; i++)
				expect((prog[i] - prog[i - 1]) * dir).toBeGreaterThanOrEqual(-1e-12 * Math.abs(prog[i]));
			// every point keeps the invariant
			for (const p of leg.points) {
				if (s.process === 'isobaric') expect(rel(p.P, leg.start.P)).toBeLessThan(1e-9);
				if (s.process === 'isochoric') expect(rel(p.v, leg.start.v)).toBeLessThan(1e-9);
				if (s.process === 'isothermal') expect(rel(p.T, leg.start.T)).toBeLessThan(1e-12);
				if (s.process === 'isentropic')
					expect(Math.abs(p.s - leg.start.s)).toBeLessThan(
						1e-8 * Math.max(1e3, Math.abs(leg.start.s))
					);
				if (s.process === 'isenthalpic')
					expect(Math.abs(p.h - leg.start.h)).toBeLessThan(
						1e-8 * Math.max(1e5, Math.abs(leg.start.h))
					);
				if (s.process === 'polytropic')
					expect(
						Math.abs(
							(p.P * p.v ** (s.n as number)) / (leg.start.P * leg.start.v ** (s.n as number)) - 1
						)
					).toBeLessThan(1e-9);
			}
			// crossings lie on the saturation lines and are points of the leg
			for (const c of leg.crossings) {
				const sat = saturationAtT(s.fluid, c.state.T);
				const ref = c.line === 'saturated-liquid' ? sat.liquid : sat.vapor;
				expect(rel(c.state.P, sat.P)).toBeLessThan(1e-9);
				expect(rel(c.state.rho, ref.rho)).toBeLessThan(1e-9);
				expect(leg.points).toContain(c.state);
			}
		});
	}

	it('follows the curve between its points: midpoints of an isentrope lie within 0.5 % of the T span of the chord', () => {
		// the true mid-state from fixState(s, v) at the geometric mean of the neighbours' v
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 800, P: 1e7 },
			process: 'isentropic',
			target: { P: 1e4 }
		});
		const span = leg.start.T - leg.end.T;
		for (let i = 1; i < leg.points.length; i++) {
			const a = leg.points[i - 1],
				b = leg.points[i];
			const v = Math.sqrt(a.v * b.v);
			const mid = fixState('water', { s: leg.start.s, v });
			expect(Math.abs(mid.T - 0.5 * (a.T + b.T))).toBeLessThan(0.005 * span);
		}
	});

	it('puts more points where the curve turns than where it runs straight', () => {
		// isobar through the dome: straight in the dome, turning in the vapor just past saturation
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 300, P: 101325 },
			process: 'isobaric',
			target: { T: 1200 },
			samples: 100
		});
		expect(leg.points.length).toBeGreaterThanOrEqual(100);
		const inDome = leg.points.filter((p) => p.phase === 'saturated-mixture').length;
		const vapor = leg.points.filter((p) => p.phase === 'superheated-vapor').length;
		expect(inDome).toBeGreaterThan(5);
		expect(vapor).toBeGreaterThan(5);
	});

	it('isotherms run flat in P through the dome and isobars flat in T', () => {
		const iso = computeLeg({
			fluid: 'water',
			start: { T: 450, P: 1e7 },
			process: 'isothermal',
			target: { P: 1e4 }
		});
		const sat = saturationAtT('water', 450);
		const wet = iso.points.filter((p) => p.phase === 'saturated-mixture');
		expect(wet.length).toBeGreaterThan(3);
		for (const p of wet) expect(rel(p.P, sat.P)).toBeLessThan(1e-12);
		const bar = computeLeg({
			fluid: 'water',
			start: { T: 300, P: 1e6 },
			process: 'isobaric',
			target: { T: 600 }
		});
		const Ts = saturationAtP('water', 1e6).T;
		for (const p of bar.points.filter((q) => q.phase === 'saturated-mixture'))
			expect(rel(p.T, Ts)).toBeLessThan(1e-12);
		// isochoric legs in the dome follow x: it rises as the wet steam at 400 K, x = 0.5 heats
		const cho = computeLeg({
			fluid: 'water',
			start: { T: 400, x: 0.5 },
			process: 'isochoric',
			target: { T: 420 }
		});
		const xs = cho.points.map((p) => p.x as number);
		for (let i = 1; i < xs.length; i++) expect(xs[i]).toBeGreaterThan(xs[i - 1]);
	});
});

describe('leg targets and refusals', () => {
	const base = { fluid: 'water', start: { T: 500, P: 101325 } } as const;
	it('ends on the first state along the leg where the target is reached (T at saturation from the liquid side)', () => {
		const Ts = saturationAtP('water', 1e5).T;
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 300, P: 1e5 },
			process: 'isobaric',
			target: { T: Ts }
		});
		expect(leg.end.phase).toBe('saturated-liquid');
		expect(leg.crossings).toEqual([]);
	});
	it('target x = 0 ends exactly on the saturated-liquid line', () => {
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 300, P: 1e5 },
			process: 'isobaric',
			target: { x: 0 }
		});
		expect(leg.end.phase).toBe('saturated-liquid');
		expect(leg.end.x).toBe(0);
	});
	it('a target equal to the start gives a zero-length leg with a note', () => {
		const leg = computeLeg({ ...base, process: 'isobaric', target: { T: 500 } });
		expect(leg.points.length).toBe(40);
		expect(leg.q).toBe(0);
		expect(leg.notes?.[0]).toMatch(/zero length/);
	});
	it('notes when the target is also reached the other way (water near its density maximum)', () => {
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 277.13, P: 101325 },
			process: 'isobaric',
			target: { v: 1.00005e-3 }
		});
		expect(leg.notes?.join(' ')).toMatch(/other way/);
	});
	it('refuses an unreachable target and states the reachable range', () => {
		const e = thrown(() => computeLeg({ ...base, process: 'isobaric', target: { T: 200 } }));
		expect(e.code).toBe('unreachable-target');
		expect(e.message).toMatch(/from 273\.16 to 1273 K/);
		const x = thrown(() =>
			computeLeg({
				fluid: 'water',
				start: { T: 700, P: 3e7 },
				process: 'isothermal',
				target: { x: 0.5 }
			})
		);
		expect(x.code).toBe('unreachable-target');
		expect(x.message).toMatch(/never enters the vapor dome/);
		const v = thrown(() =>
			computeLeg({
				fluid: 'water',
				start: { T: 800, P: 1e7 },
				process: 'isentropic',
				target: { v: 1e-4 }
			})
		);
		expect(v.code).toBe('unreachable-target');
		expect(v.message).toMatch(/reaches v from/);
	});
	it.each([
		[{ process: 'isobaric', target: { P: 2e5 } }, 'target-is-invariant'],
		[{ process: 'isochoric', target: { rho: 2 } }, 'target-is-invariant'],
		[{ process: 'isochoric', target: { v: 2 } }, 'target-is-invariant'],
		[{ process: 'isothermal', target: { T: 400 } }, 'target-is-invariant'],
		[{ process: 'isentropic', target: { s: 7000 } }, 'target-is-invariant'],
		[{ process: 'isenthalpic', target: { h: 3e6 } }, 'target-is-invariant'],
		[{ process: 'polytropic', n: 0, target: { P: 2e5 } }, 'target-is-invariant'],
		[{ process: 'polytropic', target: { P: 2e5 } }, 'invalid-leg'],
		[{ process: 'polytropic', n: 80, target: { P: 2e5 } }, 'invalid-leg'],
		[{ process: 'adiabatic', target: { T: 400 } }, 'invalid-leg'],
		[{ process: 'isobaric', target: { T: 400, h: 3e6 } }, 'invalid-leg'],
		[{ process: 'isobaric', target: {} }, 'invalid-leg'],
		[{ process: 'isobaric', target: { Q: 4 } }, 'invalid-leg'],
		[{ process: 'isobaric', target: { T: 400 }, samples: 5 }, 'invalid-leg'],
		[{ process: 'isobaric', target: { T: 400 }, samples: 40.5 }, 'invalid-leg'],
		[{ process: 'isobaric', target: { T: Number.NaN } }, 'non-finite-input'],
		[{ process: 'isobaric', target: { T: -3 } }, 'non-positive-input'],
		[{ process: 'isobaric', target: { x: 1.5 } }, 'quality-out-of-range'],
		[{ process: 'isenthalpic', target: { P: 2e5 } }, 'unreachable-target']
	])('refuses %j with %s', (extra, code) => {
		const e = thrown(() => computeLeg({ ...base, ...(extra as Partial<LegSpec>) } as LegSpec));
		expect(e.code).toBe(code);
		expect(e.message.length).toBeGreaterThan(20);
		expect(e.hint.length).toBeGreaterThan(10);
	});
	it('refuses a bad start and an unknown fluid with the engine codes', () => {
		expect(
			thrown(() =>
				computeLeg({ fluid: 'water', start: { T: 300 }, process: 'isobaric', target: { T: 400 } })
			).code
		).toBe('wrong-input-count');
		expect(
			thrown(() =>
				computeLeg({
					fluid: 'unobtainium',
					start: { T: 300, P: 1e5 },
					process: 'isobaric',
					target: { T: 400 }
				})
			).code
		).toBe('unknown-fluid');
	});
	it('gives a leg for every process with the default 40 points', () => {
		const procs: [Process, Record<string, number>, number?][] = [
			['isobaric', { T: 600 }],
			['isochoric', { T: 600 }],
			['isothermal', { P: 2e5 }],
			['isentropic', { P: 2e5 }],
			['isenthalpic', { P: 5e4 }],
			['polytropic', { P: 2e5 }, 1.2]
		];
		for (const [process, target, n] of procs) {
			const leg: Leg = computeLeg({ ...base, process, target, n });
			expect(leg.process).toBe(process);
			expect(leg.points.length).toBeGreaterThanOrEqual(40);
			if (process === 'polytropic') expect(leg.n).toBe(1.2);
		}
	});
});

describe('two-phase states assembled along a leg', () => {
	it('equal the engine’s saturatedState for the same saturation and quality', async () => {
		const { getCompiledFluid } = await import('../registry.ts');
		const { evalPoint, Point } = await import('../properties.ts');
		const { satAtT } = await import('./saturation.ts');
		const { saturatedState } = await import('../state.ts');
		for (const id of ['water', 'ammonia', 'carbon-dioxide']) {
			const fl = getCompiledFluid(id);
			for (const f of [0.05, 0.4, 0.8, 0.99]) {
				const sat = satAtT(fl, fl.Tt + f * (fl.Tc - fl.Tt));
				const L = evalPoint(fl, sat.T, sat.rhoL, new Point(), 2);
				const V = evalPoint(fl, sat.T, sat.rhoV, new Point(), 2);
				const keep = [L.P, V.P];
				// the leg passes its already evaluated phases; they must give the same State and stay unchanged
				for (const x of [0, 1e-4, 0.3, 0.999, 1])
					expect(saturatedState(fl, sat, x, L, V)).toEqual(saturatedState(fl, sat, x));
				expect([L.P, V.P]).toEqual(keep);
			}
		}
	});
});

describe('legs that meet the edges of the domain', () => {
	it('follow an isobar below the triple-point pressure as vapor (it has no saturation)', () => {
		const leg = computeLeg({
			fluid: 'water',
			start: { T: 300, P: 400 },
			process: 'isobaric',
			target: { T: 500 }
		});
		expect(leg.crossings).toEqual([]);
		expect(leg.points.every((p) => p.phase === 'superheated-vapor')).toBe(true);
		// python3-iapws 1.5.2 (Debian), IAPWS95(T=300, P=400e-6) and IAPWS95(T=500, P=400e-6): h = 2551264.98 and 2932333.26 J/kg
		expect(leg.start.h).toBeCloseTo(2551264.98, 1);
		expect(leg.end.h).toBeCloseTo(2932333.26, 1);
		expect(leg.qFlow).toBeCloseTo(2932333.26 - 2551264.98, 1);
		// and back to an entropy on the way: the target is met on the vapor branch
		const back = computeLeg({
			fluid: 'water',
			start: { T: 500, P: 400 },
			process: 'isobaric',
			target: { s: 10000 }
		});
		expect(back.end.phase).toBe('superheated-vapor');
		expect(back.end.s).toBeCloseTo(10000, 6);
	});

	it('refuse a target only reachable past a stretch below the triple point (unreachable, not no-convergence)', () => {
		// P·v^0.29 = const from dilute vapor cools below the triple point before it could meet the dome
		const spec: LegSpec = {
			fluid: 'water',
			start: { T: 731.581888357609, rho: 0.0007106054653450441 },
			process: 'polytropic',
			n: 0.29,
			target: { v: 0.00185 }
		};
		expect(() => computeLeg(spec)).toThrowError(
			expect.objectContaining({ code: 'unreachable-target' })
		);
		// the same leg toward larger v is fine
		expect(computeLeg({ ...spec, target: { v: 2000 } }).end.phase).toBe('superheated-vapor');
	});

	it('turn a curve that needs far more solves than any leg into a prompt no-convergence error', async () => {
		const { Curve, cptOfState } = await import('./leg-curve.ts');
		const { getCompiledFluid } = await import('../registry.ts');
		const fl = getCompiledFluid('water');
		const start = fixState('water', { T: 800, P: 1e6 });
		const curve = new Curve(fl, { process: 'isentropic', s: start.s }, cptOfState(fl, start));
		const seg = curve.segs[curve.segs.length - 1];
		let error: unknown = null;
		try {
			for (let i = 0; i < 60000; i++) curve.at(seg, -Math.log(start.rho), null);
		} catch (e) {
			error = e;
		}
		expect(error).toBeInstanceOf(ThermoError);
		expect((error as ThermoError).code).toBe('no-convergence');
		expect(curve.evaluations).toBeLessThan(60000);
	});
});
