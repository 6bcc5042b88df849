/**
 * The (T, ln ρ) start grid of the two-energy pairs (plane.ts) reaches Tmax: for fluids whose
 * Tmin + (Tmax − Tmin) rounds one ulp above Tmax the top isotherm used to be dropped, and states
 * in the top cell (up to ~25 K below Tmax for hydrogen) could not be fixed from (h, s), (u, s) or
 * (u, h) — refused as out of range (found by scripts/region-mix.ts, seed 11).
 */
// Source of the check values: a round-trip identity — each state, fixed from (T, P), must come back
// from two of its own energies; no value is taken from elsewhere. Tolerances 1e−9 in T and 1e−6 in P
// (or the answer's stated precision): common practice.
import { describe, expect, it } from 'vitest';
import { fixState, getFluid } from '../index.ts';
import { getCompiledFluid } from '../registry.ts';
import { isobarStart } from './plane.ts';

describe('two-energy pairs near Tmax', () => {
	for (const id of ['hydrogen', 'nitrogen', 'carbon-dioxide', 'water'])
		it(`${id}: states 1 to 20 K below Tmax come back from (h, s), (u, s) and (u, h)`, () => {
			const Tmax = getFluid(id).limits.Tmax;
			for (const dT of [1, 5, 20])
				for (const P of [2, 1.5e5]) {
					const ref = fixState(id, { T: Tmax - dT, P });
					for (const [a, b] of [
						['h', 's'],
						['u', 's'],
						['u', 'h']
					] as const) {
						const got = fixState(id, { [a]: ref[a], [b]: ref[b] }, { near: { T: ref.T, P } });
						const where = `${id} ${a},${b} at T = ${ref.T}, P = ${P}`;
						expect(Math.abs(got.T / ref.T - 1), where).toBeLessThan(1e-9);
						// (u, h) of a dilute gas fixes P only as well as its stated precision says (ideal gas: u, h of T alone)
						expect(Math.abs(got.P / P - 1), where).toBeLessThan(
							Math.max(1e-6, 8 * (got.precision?.P ?? 0))
						);
					}
				}
		});
	// the seeded region-mix state that exposed it
	it('hydrogen at 995.76 K, 151.5 kPa from (h, s)', () => {
		const st = fixState('hydrogen', { h: 14132017.612055108, s: 69287.41856979189 });
		expect(st.T).toBeCloseTo(995.7629005599271, 6);
	});
});

// Source of the check values: the states themselves, fixed from (T, P) by the engine's own
// density solve; the start read off the grid is only asked to lie near them (common practice for
// a Newton start: a few per cent), and (P, y) must come back to them.
describe('isobar starts read off the grid (P at or above Pc)', () => {
	it('none below Pc; near the state above it, for h, s and u', () => {
		for (const id of ['water', 'carbon-dioxide', 'nitrogen', 'propane']) {
			const f = getFluid(id);
			const Pc = f.equationCritical.P;
			expect(isobarStart(getCompiledFluid(id), 0.5 * Pc, 'h', 0)).toBeNull();
			for (const [kT, kP] of [
				[0.8, 1.5],
				[1.2, 3],
				[2, 10]
			]) {
				const T = Math.min(kT * f.equationCritical.T, f.limits.Tmax - 1);
				const P = Math.min(kP * Pc, f.limits.Pmax);
				const ref = fixState(id, { T, P });
				for (const w of ['h', 's', 'u'] as const) {
					const start = isobarStart(getCompiledFluid(id), P, w, ref[w]);
					const where = `${id} ${w} at T = ${T}, P = ${P}`;
					expect(start, where).not.toBeNull();
					expect(Math.abs(start![0] / T - 1), where).toBeLessThan(0.05);
					expect(Math.abs(start![1] / ref.rho - 1), where).toBeLessThan(0.1);
					const got = fixState(id, { P, [w]: ref[w] });
					expect(Math.abs(got.T / T - 1), where).toBeLessThan(1e-10);
				}
			}
		}
	});
	it('none for a value outside the isobar’s range', () => {
		const fl = getCompiledFluid('water');
		expect(isobarStart(fl, 5e7, 'h', -1e9)).toBeNull();
		expect(isobarStart(fl, 5e7, 'h', 1e9)).toBeNull();
	});
});
