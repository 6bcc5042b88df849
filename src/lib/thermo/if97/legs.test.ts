/**
 * The legs of a water path by IAPWS-IF97 (if97/path.ts: points and crossings) and IF97's vapor dome
 * (if97/dome.ts) against python3-iapws 1.5.2's IAPWS97 class: tests/reference/if97-legs.json, made by
 * tests/reference/make-if97-legs.py. The engine places a leg's points itself, so the fixture gives
 * each leg as IF97 states on a fine grid of its progress coordinate, one grid per smooth piece, and
 * each point is read off that grid by quadratic interpolation (the fixture's `tol` is that reading's
 * own error, measured by the script).
 */
import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/if97-legs.json';
import {
	computePath,
	fixState,
	if97Fix,
	if97Isolines,
	if97SaturationCurve,
	if97SaturationPressure,
	if97State,
	IF97_DOME_TOP,
	type IsolineKind,
	type PathSpec,
	type State
} from '../index.ts';
import { if97LegPoints } from './path.ts';

type Prop = 'T' | 'P' | 'v' | 'h' | 's';
const PROPS: Prop[] = ['T', 'P', 'v', 'h', 's'];
type Ref = Record<Prop, number>;
interface Piece {
	name: string;
	x: number[];
	nodes: Ref[];
	mode: Record<Prop, string>;
	tol: Record<Prop, number>;
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
/** relative for T, P, v; absolute (J/kg, J/(kg·K)) for h and s — as the fixture's tolerances */
const err = (p: Prop, a: number, b: number) =>
	p === 'h' || p === 's' ? Math.abs(a - b) : rel(a, b);

/** The fixture's rule: the quadratic through the three nodes around x, the nearest in the middle. */
function read(pc: Piece, x: number): Ref {
	const n = pc.x.length;
	let i = 0;
	for (let k = 1; k < n; k++) if (Math.abs(pc.x[k] - x) < Math.abs(pc.x[i] - x)) i = k;
	i = Math.min(Math.max(i, 1), n - 2);
	const [x0, x1, x2] = [pc.x[i - 1], pc.x[i], pc.x[i + 1]];
	const l0 = ((x - x1) * (x - x2)) / ((x0 - x1) * (x0 - x2));
	const l1 = ((x - x0) * (x - x2)) / ((x1 - x0) * (x1 - x2));
	const l2 = ((x - x0) * (x - x1)) / ((x2 - x0) * (x2 - x1));
	const out = {} as Ref;
	for (const p of PROPS) {
		// the value, or its logarithm, as the fixture's script chose and measured the reading
		const log = pc.mode[p] === 'log';
		const f = log ? Math.log : (y: number) => y;
		const y = f(pc.nodes[i - 1][p]) * l0 + f(pc.nodes[i][p]) * l1 + f(pc.nodes[i + 1][p]) * l2;
		out[p] = log ? Math.exp(y) : y;
	}
	return out;
}

const coordinate = (c: string, st: State) => (c === 'h' ? st.h : c === 'T' ? st.T : Math.log(st.P));

/** The piece whose coordinate range holds x (ranges run either way). */
function pieceAt(pieces: Piece[], x: number): Piece | null {
	for (const pc of pieces) {
		const lo = Math.min(pc.x[0], pc.x[pc.x.length - 1]);
		const hi = Math.max(pc.x[0], pc.x[pc.x.length - 1]);
		if (x >= lo - 1e-9 * Math.abs(lo) && x <= hi + 1e-9 * Math.abs(hi)) return pc;
	}
	return null;
}

function expectState(st: State, ref: Ref, what: string, tol = { r: 1e-8, h: 1e-3, s: 1e-6 }) {
	for (const p of ['T', 'P', 'v'] as const)
		expect(rel(st[p], ref[p]), `${what} ${p} ${st[p]} vs ${ref[p]}`).toBeLessThan(tol.r);
	expect(Math.abs(st.h - ref.h), `${what} h ${st.h} vs ${ref.h}`).toBeLessThan(tol.h);
	expect(Math.abs(st.s - ref.s), `${what} s ${st.s} vs ${ref.s}`).toBeLessThan(tol.s);
}

describe('leg points and crossings of an IF97 path against python3-iapws IAPWS97', () => {
	for (const lg of fixture.legs)
		it(lg.name, () => {
			// source: python3-iapws 1.5.2 IAPWS97, tests/reference/if97-legs.json
			const spec = { ...(lg.spec as PathSpec), samples: 120 };
			const r = computePath({ ...spec, formulation: 'if97' });
			const r95 = computePath(spec);
			expect(r.warnings.filter((w) => w.code === 'if97-state-unavailable')).toEqual([]);
			const leg = r.legs[0].leg;
			const leg95 = r95.legs[0].leg;
			const pieces = lg.pieces as Piece[];
			expectState(leg.points[0], lg.start, 'start');
			expectState(leg.points[leg.points.length - 1], lg.end, 'end');

			// crossings: IF97's own saturated state where the leg's invariant meets the line
			expect(leg.crossings.map((c) => c.line)).toEqual(lg.crossings.map((c) => c.line));
			leg.crossings.forEach((c, j) => {
				expect(c.state.formulation).toBeUndefined();
				expectState(c.state, lg.crossings[j].state, `crossing ${j + 1}`, {
					r: 1e-8,
					h: 1e-3,
					s: 1e-6
				});
				// the leg runs through it: one of its points is that very state
				expect(leg.points).toContain(c.state);
				// and it is not IAPWS-95's crossing (whose h lies ~1e−4 away)
				expect(Math.abs(leg95.crossings[j].state.h - lg.crossings[j].state.h)).toBeGreaterThan(1);
			});

			// every point by IF97 at its own coordinate, in order along the leg
			let checked = 0;
			let off95 = 0;
			let prev = coordinate(lg.coordinate, leg.points[0]);
			const dir = Math.sign(coordinate(lg.coordinate, leg.points.at(-1)!) - prev);
			for (const [k, pt] of leg.points.entries()) {
				expect(pt.formulation, `point ${k}`).toBeUndefined();
				const x = coordinate(lg.coordinate, pt);
				expect((x - prev) * dir, `point ${k} in order`).toBeGreaterThanOrEqual(0);
				prev = x;
				const pc = pieceAt(pieces, x);
				expect(pc, `point ${k} at ${x} lies on the leg`).not.toBeNull();
				const ref = read(pc!, x);
				for (const p of PROPS)
					expect(err(p, pt[p], ref[p]), `point ${k} (${pc!.name}) ${p}`).toBeLessThanOrEqual(
						pc!.tol[p] * 1.01
					);
				checked++;
				// the IAPWS-95 point at its own coordinate misses the IF97 curve by more than the tolerance
				const q = leg95.points[k];
				const pq = pieceAt(pieces, coordinate(lg.coordinate, q));
				if (pq) {
					const rq = read(pq, coordinate(lg.coordinate, q));
					if ((['T', 'v', 'h', 's'] as const).some((p) => err(p, q[p], rq[p]) > pq.tol[p] * 10))
						off95++;
				}
			}
			expect(checked).toBeGreaterThanOrEqual(120);
			expect(off95, 'points where IAPWS-95 is told apart').toBeGreaterThan(checked / 2);
		});
});

describe('crossings of the other processes lie on IF97’s saturation line with the leg’s invariant', () => {
	const cases: Array<[string, PathSpec['legs'][number], PathSpec['start'], 'T' | 'h' | 'Pvn']> = [
		[
			'isothermal 450 K',
			{ process: 'isothermal', target: { v: 0.5 } },
			{ T: 450, v: 0.00111 },
			'T'
		],
		[
			'throttling 10 MPa, 560 K',
			{ process: 'isenthalpic', target: { P: 1e5 } },
			{ P: 1e7, T: 560 },
			'h'
		],
		[
			'polytropic n = 1.2',
			{ process: 'polytropic', n: 1.2, target: { P: 2e4 } },
			{ P: 2e6, T: 600 },
			'Pvn'
		]
	];
	for (const [name, legSpec, start, inv] of cases)
		it(name, () => {
			const r = computePath({
				fluid: 'water',
				system: { kind: 'flow', massFlow: 1 },
				start,
				legs: [legSpec],
				formulation: 'if97'
			});
			const leg = r.legs[0].leg;
			expect(leg.crossings.length).toBeGreaterThan(0);
			const s1 = r.states[0].state;
			for (const c of leg.crossings) {
				const st = c.state;
				// on IF97's line: Eq. 30 (if97SaturationPressure) at its T, saturated on the named side
				expect(rel(st.P, if97SaturationPressure(st.T))).toBeLessThan(1e-12);
				expect(st.x).toBe(c.line === 'saturated-liquid' ? 0 : 1);
				const line = if97Fix({ T: st.T, x: st.x! });
				expect(rel(st.v, line.v)).toBeLessThan(1e-12);
				if (inv === 'T') expect(st.T).toBe(s1.T);
				if (inv === 'h') expect(Math.abs(st.h - s1.h)).toBeLessThan(1e-6);
				if (inv === 'Pvn') expect(rel(st.P * st.v ** 1.2, s1.P * s1.v ** 1.2)).toBeLessThan(1e-10);
				expect(leg.points).toContain(st);
			}
		});
});

describe('a leg ending between IF97’s saturation line and IAPWS-95’s', () => {
	// the isochore at 0.1 m³/kg meets the saturated-vapor line at 485.31734 K by IF97 (python3-iapws
	// 1.5.2 IAPWS97, tests/reference/if97-legs.json) and about 5 mK lower by IAPWS-95
	const iso = fixture.legs[2];
	const T97 = iso.crossings[0].state.T;
	const leg = (start: PathSpec['start'], T: number, formulation?: 'if97') =>
		computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start,
			legs: [{ process: 'isochoric', target: { T } }],
			...(formulation && { formulation })
		}).legs[0].leg;
	const inOrder = (pts: State[]) => {
		const d = Math.sign(pts.at(-1)!.T - pts[0].T);
		return pts.every((p, k) => k === 0 || (p.T - pts[k - 1].T) * d >= 0);
	};

	it('heated to just below IF97’s line: IAPWS-95 crosses its own line, IF97 does not', () => {
		const T2 = T97 - 4e-5;
		expect(leg({ T: 373.15, v: 0.1 }, T2).crossings).toHaveLength(1);
		const l = leg({ T: 373.15, v: 0.1 }, T2, 'if97');
		expect(l.crossings).toEqual([]);
		expect(l.end.phase).toBe('saturated-mixture');
		expect(l.points.every((p) => p.phase === 'saturated-mixture')).toBe(true);
		expect(inOrder(l.points)).toBe(true);
	});

	it('cooled to just above IAPWS-95’s line: IF97 crosses its own line, at python3-iapws’s state', () => {
		const T2 = T97 - 3e-3;
		expect(leg({ T: 600, v: 0.1 }, T2).crossings).toEqual([]);
		const l = leg({ T: 600, v: 0.1 }, T2, 'if97');
		expect(l.crossings.map((c) => c.line)).toEqual(['saturated-vapor']);
		expectState(l.crossings[0].state, iso.crossings[0].state, 'crossing');
		expect(l.points).toContain(l.crossings[0].state);
		expect(l.end.phase).toBe('saturated-mixture');
		expect(inOrder(l.points)).toBe(true);
	});
});

describe('an isochore through the critical region', () => {
	it('has its region 3 points (read straight from Eq. 28) on the basic equation at their own P and T', () => {
		// a consistency check of the direct (ρ, T) reading against the (P, T) solve of the same equation
		const r = computePath({
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 600, v: 0.0025 },
			legs: [{ process: 'isochoric', target: { T: 800 } }],
			samples: 120,
			formulation: 'if97'
		});
		const pts = r.legs[0].leg.points.filter(
			(p) => (p as State & { region?: number }).region === 3 && p.x === null
		);
		expect(pts.length).toBeGreaterThan(40);
		for (const p of pts) {
			const q = if97State(p.P, p.T);
			expect(rel(q.v, p.v)).toBeLessThan(1e-10);
			expect(Math.abs(q.h - p.h)).toBeLessThan(1e-3);
			expect(q.phase).toBe(p.phase);
		}
	});
});

describe('points IF97 cannot give', () => {
	it('a leg ending beyond IF97 keeps its IAPWS-95 points and crossings, marked', () => {
		// 60 MPa above 1073.15 K lies outside IF97 (region 5 reaches 50 MPa): R7-97(2012), range of validity
		const r = computePath({
			fluid: 'water',
			system: { kind: 'flow', massFlow: 1 },
			start: { P: 6e7, T: 1000 },
			legs: [{ process: 'isobaric', target: { T: 1100 } }],
			formulation: 'if97'
		});
		expect(r.states[1].formulation).toBe('iapws95');
		expect(r.warnings.some((w) => w.code === 'if97-state-unavailable' && w.state === 'S2')).toBe(
			true
		);
		const pts = r.legs[0].leg.points;
		expect(pts.length).toBeGreaterThan(2);
		expect(pts.every((p) => p.formulation === 'iapws95')).toBe(true);
	});

	it('a point IF97 cannot fix keeps its IAPWS-95 value, marked and counted', () => {
		const P = 1e6;
		const a = fixState('water', { P, T: 300 });
		const m = fixState('water', { P, T: 350 });
		const z = fixState('water', { P, T: 400 });
		const bad: State = { ...fixState('water', { P, T: 370 }), h: Number.NaN };
		const got = if97LegPoints(
			'isobaric',
			if97Fix({ P, T: 300 }),
			if97Fix({ P, T: 400 }),
			[a, m, bad, z],
			[]
		);
		expect(got.failed).toBe(1);
		expect(got.points[2]).toEqual({ ...bad, formulation: 'iapws95' });
		expect(got.points[1].formulation).toBeUndefined();
		expect((got.points[1] as State & { region?: number }).region).toBe(1);
	});
});

describe('background lines by IF97 against python3-iapws IAPWS97', () => {
	// the same curves as the fixture's legs: the 1 MPa isobar, the isentrope of 10 MPa and 800 K, the
	// isochore of 0.1 m³/kg; each line's points within a leg's range read off its grid as above
	const cases: Array<[IsolineKind, number, (typeof fixture.legs)[number]]> = [
		['isobar', 1e6, fixture.legs[0]],
		['isentrope', fixture.legs[1].start.s, fixture.legs[1]],
		['isochore', 0.1, fixture.legs[2]]
	];
	for (const [kind, value, lg] of cases)
		it(`${kind} ${value}`, () => {
			const [line] = if97Isolines(kind, [value], 80);
			const pieces = lg.pieces as Piece[];
			let checked = 0;
			for (const pt of line.points) {
				const x = coordinate(lg.coordinate, pt as State);
				const pc = pieceAt(pieces, x);
				if (!pc) continue;
				const ref = read(pc, x);
				for (const p of PROPS)
					expect(err(p, pt[p], ref[p]), `${kind} at ${x} (${pc.name}) ${p}`).toBeLessThanOrEqual(
						pc.tol[p] * 1.01
					);
				checked++;
			}
			expect(checked).toBeGreaterThan(15);
			// IF97 stops at 100 MPa: no point beyond it
			expect(line.points.every((p) => p.P <= 100e6 * (1 + 1e-12))).toBe(true);
		});
	it('quality lines stop where the IF97 dome does', () => {
		const [line] = if97Isolines('quality', [0.5], 80);
		expect(line.points.length).toBeGreaterThan(50);
		expect(Math.max(...line.points.map((p) => p.T))).toBeLessThanOrEqual(IF97_DOME_TOP);
		// each point IF97's lever rule at its T (if97Fix (T, x) is checked against python3-iapws
		// IAPWS97(T, x) in fix.test.ts)
		for (const p of line.points) {
			const l = if97Fix({ T: p.T, x: 0 });
			const g = if97Fix({ T: p.T, x: 1 });
			expect(rel(p.v, 0.5 * (l.v + g.v))).toBeLessThan(1e-12);
		}
	});
});

describe('the IF97 vapor dome against python3-iapws IAPWS97(T, x)', () => {
	const dome = if97SaturationCurve(100);
	it('runs from 273.15 K to 643.15 K and is closed at IF97’s critical point, saying so', () => {
		expect(dome.liquid).toHaveLength(100);
		expect(dome.liquid[0].T).toBe(273.15);
		expect(dome.liquid[99].T).toBe(IF97_DOME_TOP);
		expect(dome.stopsAt).toBe(643.15);
		expect(dome.formulation).toBe('if97');
		expect(dome.note).toMatch(/IAPWS-IF97.*643\.15 K/);
		// IAPWS R7-97(2012), Eqs. 2–4: Tc = 647.096 K, pc = 22.064 MPa, ρc = 322 kg/m³; Eq. 28 at (ρc, Tc)
		// gives pc to ~1e−8 (from memory of the release's consistency statement)
		expect(dome.critical.T).toBe(647.096);
		expect(dome.critical.rho).toBe(322);
		expect(rel(dome.critical.P, 22.064e6)).toBeLessThan(1e-6);
	});
	for (const d of fixture.dome)
		it(`at ${d.T.toFixed(3)} K (point ${d.index})`, () => {
			// source: python3-iapws 1.5.2 IAPWS97(T, x = 0 and 1), tests/reference/if97-legs.json. Above
			// 623.15 K (region 3) python3-iapws takes the densities from the backward equations of the
			// supplementary release, which agree with the basic equation to ~1e−5 there (IF97 and IAPWS-95
			// differ by ~1e−3 there)
			const tol = d.T <= 623.15 ? { r: 1e-8, h: 1e-3, s: 1e-6 } : { r: 2e-5, h: 20, s: 2e-2 };
			expect(rel(dome.liquid[d.index].T, d.T)).toBeLessThan(1e-12);
			expectState(dome.liquid[d.index], d.liquid, 'liquid', tol);
			expectState(dome.vapor[d.index], d.vapor, 'vapor', tol);
			expect(dome.liquid[d.index].phase).toBe('saturated-liquid');
			expect(dome.vapor[d.index].phase).toBe('saturated-vapor');
		});
});
