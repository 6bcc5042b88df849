/**
 * Every refusal path of the engine: a ThermoError with its stable code, a message and a hint —
 * and never a NaN or Infinity in a returned state (random inputs through every pair).
 */
import { describe, expect, it } from 'vitest';
import { ThermoError, fmt, type ThermoErrorCode } from './errors.ts';
import {
	computeLeg,
	fixState,
	getFluid,
	saturationAtP,
	saturationAtT,
	saturationCurve
} from './index.ts';
import { water } from './fluids/water.ts';
import { expectFinite, PAIRS } from './pairs.test-support.ts';
import { loadFluid } from './registry.ts';
import { fixStateOf } from './solvers/fix-state.ts';
import type { FluidData } from './fluids/schema.ts';
import type { Inputs } from './types.ts';

function code(f: () => unknown): ThermoErrorCode {
	try {
		f();
	} catch (e) {
		expect(e).toBeInstanceOf(ThermoError);
		const t = e as ThermoError;
		expect(t.message.length).toBeGreaterThan(10);
		expect(t.hint.length).toBeGreaterThan(10);
		expect(JSON.parse(JSON.stringify(t)).code).toBe(t.code);
		return t.code;
	}
	throw new Error('expected a ThermoError');
}

describe('ThermoError codes', () => {
	it('unknown-fluid', () => {
		expect(code(() => fixState('plasma', { T: 300, P: 1e5 }))).toBe('unknown-fluid');
		expect(code(() => getFluid('plasma'))).toBe('unknown-fluid');
	});
	it('input shape: unknown-input, wrong-input-count, duplicate-property', () => {
		expect(code(() => fixState('water', { T: 300, Q: 1 } as unknown as Inputs))).toBe(
			'unknown-input'
		);
		expect(code(() => fixState('water', { T: 300 }))).toBe('wrong-input-count');
		expect(code(() => fixState('water', { T: 300, P: 1e5, h: 1e5 }))).toBe('wrong-input-count');
		expect(code(() => fixState('water', null as unknown as Inputs))).toBe('wrong-input-count');
		expect(code(() => fixState('water', { v: 1, rho: 1 }))).toBe('duplicate-property');
	});
	it('values: non-finite-input, non-positive-input, quality-out-of-range', () => {
		expect(code(() => fixState('water', { T: Number.NaN, P: 1e5 }))).toBe('non-finite-input');
		expect(code(() => fixState('water', { T: 300, P: Number.POSITIVE_INFINITY }))).toBe(
			'non-finite-input'
		);
		expect(code(() => fixState('water', { T: 300, P: '1e5' as unknown as number }))).toBe(
			'non-finite-input'
		);
		expect(code(() => fixState('water', { T: -5, P: 1e5 }))).toBe('non-positive-input');
		expect(code(() => fixState('water', { T: 300, v: 0 }))).toBe('non-positive-input');
		expect(code(() => fixState('water', { T: 300, x: 1.2 }))).toBe('quality-out-of-range');
		expect(code(() => fixState('water', { P: 1e5, x: -0.1 }))).toBe('quality-out-of-range');
	});
	it('range: below-triple-point, out-of-range', () => {
		expect(code(() => fixState('water', { T: 250, P: 1e5 }))).toBe('below-triple-point');
		expect(code(() => fixState('water', { P: 100, x: 0.5 }))).toBe('below-triple-point');
		expect(code(() => saturationAtT('water', 200))).toBe('below-triple-point');
		expect(code(() => fixState('water', { T: 1500, P: 1e5 }))).toBe('out-of-range');
		expect(code(() => fixState('water', { T: 300, P: 2e9 }))).toBe('out-of-range');
		expect(code(() => fixState('water', { T: 300, rho: 1300 }))).toBe('out-of-range');
		expect(code(() => fixState('water', { P: 1e5, h: 9e6 }))).toBe('out-of-range');
		expect(code(() => fixState('water', { T: 500, h: 9e6 }))).toBe('out-of-range');
	});
	it('two-phase-pressure-temperature, and the hints that pick a saturated end', () => {
		const sat = saturationAtT('water', 373.15);
		expect(code(() => fixState('water', { T: 373.15, P: sat.P }))).toBe(
			'two-phase-pressure-temperature'
		);
		expect(fixState('water', { T: 373.15, P: sat.P }, { hint: 'liquid-side' }).phase).toBe(
			'saturated-liquid'
		);
		expect(fixState('water', { T: 373.15, P: sat.P }, { hint: 'vapor-side' }).phase).toBe(
			'saturated-vapor'
		);
	});
	it('inconsistent-inputs: a quality above the critical point', () => {
		expect(code(() => fixState('water', { T: 700, x: 0.5 }))).toBe('inconsistent-inputs');
		expect(code(() => fixState('water', { P: 30e6, x: 0.5 }))).toBe('inconsistent-inputs');
		expect(code(() => saturationAtT('water', 700))).toBe('inconsistent-inputs');
		expect(code(() => saturationAtP('water', 30e6))).toBe('inconsistent-inputs');
		expect(code(() => fixState('water', { h: 9e6, x: 0.5 }))).toBe('inconsistent-inputs');
	});
	it('ambiguous-state names both candidates; hint and near choose', () => {
		// water's density maximum near 4 °C: (P, v) of liquid at 1 MPa has two temperatures
		const s = fixState('water', { T: 275, P: 1e6 });
		let err: ThermoError | undefined;
		try {
			fixState('water', { P: 1e6, v: s.v });
		} catch (e) {
			err = e as ThermoError;
		}
		expect(err?.code).toBe('ambiguous-state');
		expect(err?.candidates?.length).toBe(2);
		expect(err?.message).toMatch(/compressed-liquid at T = 275 K/);
		const lo = fixState('water', { P: 1e6, v: s.v }, { hint: 'lower-T' });
		const hi = fixState('water', { P: 1e6, v: s.v }, { hint: 'higher-T' });
		expect(Math.abs(lo.T - 275)).toBeLessThan(1e-7);
		expect(hi.T).toBeGreaterThan(277.2);
		expect(fixState('water', { P: 1e6, v: s.v }, { near: { T: 280 } }).T).toBe(hi.T);
	});
	it('invalid-option', () => {
		expect(code(() => fixState('water', { T: 300, P: 1e5 }, { hint: 'colder' as never }))).toBe(
			'invalid-option'
		);
		expect(code(() => fixState('water', { T: 300, P: 1e5 }, { near: { T: -1 } }))).toBe(
			'invalid-option'
		);
		expect(code(() => saturationCurve('water', 1.5))).toBe('invalid-option');
	});
	it('no-convergence: an equation with no phase change has no saturation', () => {
		const d = structuredClone(water) as FluidData;
		d.id = 'ideal-steam';
		d.residual = [{ kind: 'polynomial', n: [1e-6], d: [1], t: [1] }];
		const fl = loadFluid(d);
		expect(code(() => fixStateOf(fl, { T: 400, x: 0.5 }))).toBe('no-convergence');
	});
	it('invalid-fluid-data (see fluid-loading.test.ts for every field)', () => {
		const d = structuredClone(water) as FluidData;
		d.molarMass = 0;
		expect(code(() => loadFluid(d))).toBe('invalid-fluid-data');
	});
});

describe('no NaN or Infinity ever returned', () => {
	it('random inputs through every pair give a finite state or a ThermoError', () => {
		let seed = 12345;
		const rnd = () => {
			seed = (seed * 1103515245 + 12345) % 2147483648;
			return seed / 2147483648;
		};
		const draw: Record<string, () => number> = {
			T: () => 250 + rnd() * 1100,
			P: () => 10 ** (1 + rnd() * 8.2),
			v: () => 10 ** (-3.2 + rnd() * 6),
			u: () => -2e5 + rnd() * 4.5e6,
			h: () => -2e5 + rnd() * 5e6,
			s: () => -500 + rnd() * 12000,
			x: () => -0.1 + rnd() * 1.2
		};
		let states = 0,
			refusals = 0;
		for (let k = 0; k < 420; k++) {
			const [a, b] = PAIRS[k % PAIRS.length];
			const inputs = { [a]: draw[a](), [b]: draw[b]() } as Inputs;
			try {
				expectFinite(fixState('water', inputs));
				states++;
			} catch (e) {
				if (!(e instanceof ThermoError)) throw e;
				expect(e.code).not.toBe('no-convergence');
				refusals++;
			}
		}
		expect(states).toBeGreaterThan(50);
		expect(refusals).toBeGreaterThan(50);
	});
});

describe('message numbers never contradict the message', () => {
	function message(f: () => unknown): string {
		try {
			f();
		} catch (e) {
			return (e as Error).message + ' ' + (e as ThermoError).hint;
		}
		throw new Error('expected a ThermoError');
	}

	it('prints as many digits as it takes to differ from the bound it is compared with', () => {
		expect(fmt(1 + 1e-12, 0, 1)).not.toBe('1');
		expect(fmt(101325)).toBe('101325');
		expect(fmt(1 + 1e-12, 0, 1)).toBe(String(1 + 1e-12));
		expect(fmt(2.5e7)).toBe('2.5e+7');
		expect(fmt(1.0000001e9, 1e9)).toBe('1.0000001e+9');
	});

	it('a quality just above 1, a T just below the triple point, a P just above the limit', () => {
		const x = 1 + 2 ** -40;
		expect(message(() => fixState('water', { T: 300, x }))).toContain(`got ${fmt(x)}`);
		expect(message(() => fixState('water', { T: 300, x }))).not.toMatch(/got 1\)/);
		const T = 273.16 * (1 - 1e-11);
		const m = message(() => fixState('water', { T, P: 1e5 }));
		// the given T and the triple-point T print differently
		const printed = [...m.matchAll(/T = ([0-9.e+-]+) K/g)].map((r) => r[1]);
		expect(printed.length).toBeGreaterThan(0);
		expect(m).toContain('273.16 K');
		expect(printed[0]).not.toBe('273.16');
		const P = 1e9 * (1 + 1e-10);
		const mp = message(() => fixState('water', { T: 300, P }));
		expect(mp).not.toMatch(/P = 1e\+9 Pa is above/);
	});
});

describe('messages never contradict themselves', () => {
	function message(f: () => unknown): string {
		try {
			f();
		} catch (e) {
			return (e as Error).message;
		}
		throw new Error('expected a refusal');
	}
	const justOver = 1 + Number.EPSILON;

	it('prints a value as many digits as it takes to differ from the bound it breaks', () => {
		expect(message(() => fixState('water', { T: 300, x: justOver }))).toBe(
			'The quality x must lie between 0 and 1 (got 1.0000000000000002).'
		);
		expect(
			message(() =>
				computeLeg({
					fluid: 'water',
					start: { T: 400, x: 0.5 },
					process: 'isobaric',
					target: { x: justOver }
				})
			)
		).toBe('The target quality x must lie between 0 and 1 (got 1.0000000000000002).');
		expect(message(() => fixState('water', { T: 300, P: -5e-324 }))).toMatch(
			/got -4\.94066e-324\)/
		);
		// a temperature a hair above the critical one is not printed as the critical one
		const Tc = getFluid('water').critical.T;
		const over = Tc * (1 + 4 * Number.EPSILON);
		const m = message(() => saturationAtT('water', over));
		const [shownT, shownTc] = [/T = ([\d.]+) K\./.exec(m)?.[1], /\(([\d.]+) K\)/.exec(m)?.[1]];
		expect(shownT).not.toBe(shownTc);
	});

	it('fmt: 6 significant digits unless a bound would print the same', () => {
		expect(fmt(101325)).toBe('101325');
		expect(fmt(1.0000000000000002, 0, 1)).toBe('1.0000000000000002');
		expect(fmt(0.99999999, 0, 1)).toBe('0.99999999');
		expect(fmt(2.5e7, 1e7)).toBe('2.5e+7');
	});
});
