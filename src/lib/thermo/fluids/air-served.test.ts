/**
 * Air as served (fluids/air.ts `air`, pseudo-pure.ts): the reference state on its bubble line, the
 * band between the bubble and dew lines refused for every input pair and for legs, both lines drawn,
 * and the 21 input pairs outside the band. Check values name their source; round trips are
 * identities (a state re-fixed from two of its own properties).
 */
import { describe, expect, it } from 'vitest';
import {
	computeLeg,
	computePath,
	fixState,
	meltingPressure,
	saturationAtT,
	saturationCurve
} from '../index.ts';
import type { State } from '../types.ts';
import { ThermoError } from '../errors.ts';

const M = 0.0289586;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function code(f: () => unknown): string | undefined {
	try {
		f();
	} catch (e) {
		return (e as ThermoError).code;
	}
	return undefined;
}

describe('air: reference state and check values', () => {
	it('h = s = 0 for the liquid at its bubble point at 101.325 kPa, 78.903 K (pychemqt lib/mEoS/Air.py, Tb)', () => {
		const b = fixState('air', { P: 101325, x: 0 });
		expect(b.phase).toBe('saturated-liquid');
		expect(Math.abs(b.T - 78.903)).toBeLessThan(1e-3);
		expect(Math.abs(b.h)).toBeLessThan(1e-6);
		expect(Math.abs(b.s)).toBeLessThan(1e-9);
	});

	it('density at 100 K, 0.101325 MPa is 0.12449 mol/dm³ (Lemmon et al. 2000, Table A2, via pychemqt)', () => {
		const s = fixState('air', { T: 100, P: 101325 });
		expect(s.phase).toBe('superheated-vapor');
		expect(Math.abs(s.rho / (M * 1e3) - 0.12449)).toBeLessThan(0.000005);
	});

	it('energy differences do not depend on the reference state: Δh (500 K, 0.2 MPa) − (100 K, 0.101325 MPa) = 11735.9 J/mol (Table A2)', () => {
		const dh = fixState('air', { T: 500, P: 2e5 }).h - fixState('air', { T: 100, P: 101325 }).h;
		// 14578 − 2842.1 J/mol as printed (last digit ±1 in the larger)
		expect(Math.abs(dh * M - (14578 - 2842.1))).toBeLessThan(1);
	});

	it('melting line of Lemmon et al. (2000) as CoolProp carries it (Simon form)', () => {
		// CoolProp dev/fluids/Air.json: p = 5264.1810687705665 + 186844210.7644081·((T/59.75)^1.78963 − 1)
		const P = 5264.1810687705665 + 186844210.7644081 * (Math.pow(70 / 59.75, 1.78963) - 1);
		expect(rel(meltingPressure('air', 70)?.P as number, P)).toBeLessThan(2e-4);
	});
});

describe('air: the band between the bubble and dew lines', () => {
	it('refuses (T, P) inside the band and serves either side of it', () => {
		// Table A1 of Lemmon et al. (2000), via pychemqt: at 100 K dew 0.56742 MPa, bubble 0.66313 MPa
		expect(code(() => fixState('air', { T: 100, P: 0.6e6 }))).toBe('mixture-two-phase');
		expect(fixState('air', { T: 100, P: 0.7e6 }).phase).toBe('compressed-liquid');
		expect(fixState('air', { T: 100, P: 0.5e6 }).phase).toBe('superheated-vapor');
		expect(fixState('air', { T: 200, P: 10e6 }).phase).toBe('supercritical-fluid');
	});

	it('the refusal says why and what to give instead', () => {
		let err: ThermoError | undefined;
		try {
			fixState('air', { T: 100, P: 0.6e6 });
		} catch (e) {
			err = e as ThermoError;
		}
		expect(err?.message).toMatch(/Air is a mixture/);
		expect(err?.message).toMatch(/different compositions/);
		expect(err?.hint).toMatch(/above .* Pa \(liquid\) or below .* Pa \(gas\)/);
	});

	it('refuses two-phase states given by any pair: the middle of the band by (T, v), (P, h), (h, s), (T, x = 0.5)', () => {
		const L = fixState('air', { T: 100, x: 0 });
		const V = fixState('air', { T: 100, x: 1 });
		const mid = { v: 0.5 * (L.v + V.v), h: 0.5 * (L.h + V.h), s: 0.5 * (L.s + V.s) };
		expect(code(() => fixState('air', { T: 100, v: mid.v }))).toBe('mixture-two-phase');
		expect(code(() => fixState('air', { P: 0.6e6, h: mid.h }))).toBe('mixture-two-phase');
		expect(code(() => fixState('air', { h: mid.h, s: mid.s }))).toBe('mixture-two-phase');
		expect(code(() => fixState('air', { T: 100, x: 0.5 }))).toBe('mixture-two-phase');
	});

	it('x = 0 is the bubble point and x = 1 the dew point: at 100 K 0.66313 and 0.56742 MPa (Table A1)', () => {
		expect(Math.abs(fixState('air', { T: 100, x: 0 }).P / 1e6 - 0.66313)).toBeLessThan(5e-6);
		expect(Math.abs(fixState('air', { T: 100, x: 1 }).P / 1e6 - 0.56742)).toBeLessThan(5e-6);
		expect(code(() => fixState('air', { T: 140, x: 0 }))).toBe('inconsistent-inputs');
	});

	it('has no single saturation: saturationAtT says so', () => {
		expect(code(() => saturationAtT('air', 100))).toBe('mixture-two-phase');
	});

	it('draws both lines: the bubble line as liquid above the dew line as vapor, meeting at the maxcondentherm', () => {
		const c = saturationCurve('air', 30);
		expect(c.liquid.length).toBe(30);
		expect(c.vapor.length).toBe(30);
		for (let i = 0; i < 30; i++) {
			expect(c.liquid[i].T).toBe(c.vapor[i].T);
			expect(c.liquid[i].P).toBeGreaterThan(c.vapor[i].P);
			expect(c.liquid[i].rho).toBeGreaterThan(c.vapor[i].rho);
		}
		// the maxcondentherm, the equation's reducing point: 132.6312 K, 3.78502 MPa (Lemmon et al. 2000)
		expect(c.critical.T).toBe(132.6312);
		expect(c.critical.P).toBe(3.78502e6);
		expect((c.melting ?? []).length).toBeGreaterThan(10);
	});
});

describe('air: the 21 input pairs outside the band', () => {
	const refs: [string, State][] = [
		['gas at 300 K, 1 atm', fixState('air', { T: 300, P: 101325 })],
		['vapor at 100 K, 0.3 MPa', fixState('air', { T: 100, P: 0.3e6 })],
		['liquid at 90 K, 5 MPa', fixState('air', { T: 90, P: 5e6 })],
		['supercritical at 200 K, 10 MPa', fixState('air', { T: 200, P: 10e6 })],
		['hot gas at 800 K, 30 MPa', fixState('air', { T: 800, P: 30e6 })]
	];
	const keys = ['T', 'P', 'v', 'u', 'h', 's'] as const;
	for (const [name, ref] of refs)
		it(`${name}: every pair of T, P, v, u, h, s gives it back`, () => {
			for (let i = 0; i < keys.length; i++)
				for (let j = i + 1; j < keys.length; j++) {
					const a = keys[i],
						b = keys[j];
					const got = fixState(
						'air',
						{ [a]: ref[a], [b]: ref[b] },
						{ near: { T: ref.T, P: ref.P } }
					);
					expect(rel(got.T, ref.T), `${a},${b}`).toBeLessThan(1e-6);
					expect(rel(got.P, ref.P), `${a},${b}`).toBeLessThan(1e-6);
					expect(got.phase, `${a},${b}`).toBe(ref.phase);
				}
		});

	it('drops a candidate inside the band: (T, h) of the 90 K, 5 MPa liquid has one answer', () => {
		const ref = fixState('air', { T: 90, P: 5e6 });
		expect(rel(fixState('air', { T: 90, h: ref.h }).P, 5e6)).toBeLessThan(1e-6);
	});

	it('a bubble or dew point re-fixed from (P, h), (T, v) or (h, s) is the line state, not refused', () => {
		for (const x of [0, 1]) {
			const ref = fixState('air', { T: 81.3844, x });
			for (const inputs of [
				{ P: ref.P, h: ref.h },
				{ T: ref.T, v: ref.v },
				{ h: ref.h, s: ref.s }
			]) {
				const got = fixState('air', inputs, { near: { T: ref.T, P: ref.P } });
				expect(rel(got.T, ref.T), JSON.stringify(inputs)).toBeLessThan(1e-6);
				expect(got.x, JSON.stringify(inputs)).toBe(x);
			}
		}
	});

	it('the six x pairs on each line give the line state back', () => {
		for (const x of [0, 1]) {
			const ref = fixState('air', { T: 95, x });
			for (const k of ['T', 'P', 'v', 'u', 'h', 's'] as const) {
				const got = fixState('air', { [k]: ref[k], x });
				expect(rel(got.T, ref.T), `${k},x=${x}`).toBeLessThan(1e-6);
				expect(rel(got.P, ref.P), `${k},x=${x}`).toBeLessThan(1e-6);
			}
		}
	});
});

describe('air: legs and paths', () => {
	it('an isobaric cooling leg that would enter the band is refused, naming where', () => {
		let err: ThermoError | undefined;
		try {
			computeLeg({
				fluid: 'air',
				start: { T: 300, P: 101325 },
				process: 'isobaric',
				target: { T: 60 }
			});
		} catch (e) {
			err = e as ThermoError;
		}
		expect(err?.code).toBe('mixture-two-phase');
		expect(err?.message).toMatch(/isobaric leg .* enters the two-phase band of air/);
		expect(err?.hint).toMatch(/dew/);
	});

	it('legs that stay outside the band are served with the band’s phase labels', () => {
		const cool = computeLeg({
			fluid: 'air',
			start: { T: 300, P: 101325 },
			process: 'isobaric',
			target: { T: 150 }
		});
		expect(cool.end.phase).toBe('superheated-vapor');
		const comp = computeLeg({
			fluid: 'air',
			start: { T: 300, P: 101325 },
			process: 'isentropic',
			target: { P: 20e6 }
		});
		expect(comp.end.phase).toBe('supercritical-fluid');
		expect(comp.crossings).toEqual([]);
		// around the band: a supercritical isobar cooled to a liquid
		const around = computeLeg({
			fluid: 'air',
			start: { T: 200, P: 10e6 },
			process: 'isobaric',
			target: { T: 90 }
		});
		expect(around.end.phase).toBe('compressed-liquid');
	});

	it('a path whose second leg enters the band names that leg', () => {
		let err: ThermoError | undefined;
		try {
			computePath({
				fluid: 'air',
				system: { kind: 'closed' },
				start: { T: 300, P: 101325 },
				legs: [
					{ id: 'L1', process: 'isothermal', target: { P: 0.5e6 } },
					{ id: 'L2', process: 'isobaric', target: { T: 90 } }
				]
			});
		} catch (e) {
			err = e as ThermoError;
		}
		expect(err?.code).toBe('mixture-two-phase');
		expect(err?.message).toMatch(/L2/);
	});

	it('a leg cannot start on a line', () => {
		expect(
			code(() =>
				computeLeg({
					fluid: 'air',
					start: { T: 90, x: 0 },
					process: 'isothermal',
					target: { P: 5e6 }
				})
			)
		).toBe('mixture-two-phase');
	});
});
