/**
 * options.window: roots outside a pressure/temperature window are not answers. Cases from the
 * issue 11 audit: (T, s) and (T, u) in cold water have three states (a mixture at about 706 Pa,
 * the everyday liquid, and one at 18–43 MPa); a window selects the everyday liquid.
 */
import { describe, expect, it } from 'vitest';
import { ThermoError } from '../errors.ts';
import { fixState } from '../index.ts';

function code(f: () => unknown): string {
	try {
		f();
	} catch (e) {
		return (e as ThermoError).code;
	}
	return 'none';
}

describe('options.window', () => {
	it('selects the everyday liquid among three cold-water states for (T, s) and (T, u)', () => {
		const ref = fixState('water', { T: 275, P: 1e6 });
		for (const inputs of [
			{ T: 275, s: ref.s },
			{ T: 275, u: ref.u }
		]) {
			let n = 0;
			try {
				fixState('water', inputs);
			} catch (e) {
				n = (e as ThermoError).candidates?.length ?? 0;
			}
			expect(n).toBe(3);
			const st = fixState('water', inputs, { window: { Pmin: 1e5, Pmax: 1e7 } });
			expect(Math.abs(st.P - 1e6) / 1e6).toBeLessThan(Math.max(1e-6, 8 * st.precision!.P));
		}
	});

	it('the default window is the whole range: nothing is chosen silently', () => {
		const ref = fixState('water', { T: 275, P: 1e6 });
		expect(code(() => fixState('water', { T: 275, s: ref.s }))).toBe('ambiguous-state');
	});

	it('refuses with outside-window, naming the states outside, when it excludes every answer', () => {
		let err: ThermoError | undefined;
		try {
			fixState('water', { T: 300, P: 1e5 }, { window: { Pmin: 2e5 } });
		} catch (e) {
			err = e as ThermoError;
		}
		expect(err?.code).toBe('outside-window');
		expect(err?.message).toMatch(/P ≥ 200000 Pa/);
		expect(err?.candidates?.length).toBe(1);
		const ref = fixState('water', { T: 275, P: 1e6 });
		expect(code(() => fixState('water', { T: 275, s: ref.s }, { window: { Tmin: 400 } }))).toBe(
			'outside-window'
		);
	});

	it('refuses a malformed or empty window as invalid-option', () => {
		expect(code(() => fixState('water', { T: 300, P: 1e5 }, { window: { Pmin: -1 } }))).toBe(
			'invalid-option'
		);
		expect(
			code(() => fixState('water', { T: 300, P: 1e5 }, { window: { Pmin: 2e5, Pmax: 1e5 } }))
		).toBe('invalid-option');
	});
});
