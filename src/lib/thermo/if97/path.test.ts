/**
 * Water paths computed with IAPWS-IF97 (computePath with formulation 'if97'; if97/path.ts): states
 * and each leg's Q and W against python3-iapws 1.5.2's IAPWS97 class (tests/reference/if97-fix.json,
 * made by tests/reference/make-if97-fix.py: the same pairs, Q and W by Q = Δh isobaric, Δu
 * isochoric, TΔs isothermal, 0 isentropic/throttling and W = Q − Δu).
 */
import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/if97-fix.json';
import { computePath, ThermoError, type PathSpec } from '../index.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe('water paths by IAPWS-IF97 against python3-iapws IAPWS97', () => {
	for (const p of fixture.paths)
		it(p.name, () => {
			// source: python3-iapws 1.5.2 IAPWS97, tests/reference/if97-fix.json
			const spec = { ...(p.spec as PathSpec), formulation: 'if97' as const };
			const r = computePath(spec);
			expect(r.formulation).toBe('if97');
			expect(r.states).toHaveLength(p.states.length);
			r.states.forEach((ps, i) => {
				const ref = p.states[i];
				expect(ps.formulation).toBe('if97');
				expect(rel(ps.state.T, ref.T), `S${i + 1} T`).toBeLessThan(1e-8);
				expect(rel(ps.state.P, ref.P), `S${i + 1} P ${ps.state.P} vs ${ref.P}`).toBeLessThan(1e-7);
				expect(rel(ps.state.v, ref.v), `S${i + 1} v`).toBeLessThan(1e-7);
				expect(Math.abs(ps.state.h - ref.h), `S${i + 1} h`).toBeLessThan(1e-3);
				expect(Math.abs(ps.state.s - ref.s), `S${i + 1} s`).toBeLessThan(1e-6);
				// the IAPWS-95 state is kept beside it, and differs (by ~1e-4, not zero)
				expect(ps.iapws95).toBeDefined();
				expect(ps.iapws95!.h).not.toBe(ps.state.h);
			});
			r.legs.forEach((l, i) => {
				const ref = p.legs[i];
				const closed = r.system.kind === 'closed';
				const Q = closed ? l.totals.Q : l.totals.QFlow;
				const W = closed ? l.totals.W : l.totals.WShaft;
				expect(Math.abs(Q - ref.Q), `L${i + 1} Q ${Q} vs ${ref.Q}`).toBeLessThan(
					1e-6 * Math.abs(ref.Q) + 1e-2
				);
				expect(Math.abs(W - ref.W), `L${i + 1} W ${W} vs ${ref.W}`).toBeLessThan(
					1e-6 * Math.abs(ref.W) + 1e-2
				);
			});
		});

	it('without formulation the same spec is IAPWS-95 and carries no IF97 fields', () => {
		const r = computePath(fixture.paths[0].spec as PathSpec);
		expect(r.formulation).toBeUndefined();
		expect(r.states[0].iapws95).toBeUndefined();
	});

	it('refuses IF97 for a fluid other than water, and an unknown formulation', () => {
		const spec = {
			...(fixture.paths[0].spec as PathSpec),
			fluid: 'nitrogen',
			start: { T: 300, P: 1e6 }
		};
		expect(() => computePath({ ...spec, formulation: 'if97' })).toThrow(/water only/);
		expect(() =>
			computePath({ ...(fixture.paths[0].spec as PathSpec), formulation: 'x' as 'if97' })
		).toThrow(ThermoError);
	});

	it('a state beyond IF97 (above 100 MPa) stays IAPWS-95 with a warning naming it', () => {
		const r = computePath({
			fluid: 'water',
			system: { kind: 'closed' },
			start: { T: 300, P: 1e6 },
			legs: [{ id: 'La', process: 'isothermal', target: { P: 2e8 } }],
			formulation: 'if97'
		});
		expect(r.states[0].formulation).toBe('if97');
		expect(r.states[1].formulation).toBe('iapws95');
		const w = r.warnings.find((x) => x.code === 'if97-state-unavailable');
		expect(w?.state).toBe('S2');
		expect(w?.message).toMatch(/IAPWS-IF97/);
		// the leg keeps its IAPWS-95 energies
		expect(Number.isFinite(r.legs[0].leg.q)).toBe(true);
	});

	it('a polytropic leg: the IF97 end keeps P·vⁿ of the IF97 start and meets the target; w by the identity', () => {
		const n = 1.25;
		const spec: PathSpec = {
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 600, P: 1e6 },
			legs: [{ id: 'Lp', process: 'polytropic', n, target: { T: 520 } }],
			formulation: 'if97'
		};
		const r = computePath(spec);
		const [a, b] = r.states.map((s) => s.state);
		expect(r.states[1].formulation).toBe('if97');
		expect(rel(b.P * b.v ** n, a.P * a.v ** n)).toBeLessThan(1e-9);
		expect(rel(b.T, 520)).toBeLessThan(1e-9);
		// identities of a polytrope (not the engine's quadrature): w = (P₂v₂ − P₁v₁)/(1 − n), q = Δu + w
		const leg = r.legs[0].leg;
		expect(rel(leg.w, (b.P * b.v - a.P * a.v) / (1 - n))).toBeLessThan(1e-12);
		expect(rel(leg.q, b.u - a.u + leg.w)).toBeLessThan(1e-12);
		// and the IAPWS-95 leg's quadrature agrees to the formulations' difference (~1e−4)
		const spec95: PathSpec = { ...spec, formulation: 'iapws95' };
		expect(rel(leg.w, computePath(spec95).legs[0].leg.w)).toBeLessThan(2e-3);
	});
});
