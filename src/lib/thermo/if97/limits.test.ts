/**
 * Design-limit events of water paths computed with IAPWS-IF97 (if97/path.ts if97LimitEvents): the
 * state where a leg reaches a design pressure or temperature is IF97's, against python3-iapws 1.5.2's
 * IAPWS97 (tests/reference/if97-limits.json, made by tests/reference/make-if97-limits.py), and the
 * warnings carry those states.
 */
import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/if97-limits.json';
import { computePath, type PathSpec } from '../index.ts';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe('design-limit events of an IF97 path against python3-iapws IAPWS97', () => {
	for (const p of fixture.paths)
		it(p.name, () => {
			// source: python3-iapws 1.5.2 IAPWS97, tests/reference/if97-limits.json
			const spec = p.spec as PathSpec;
			const r = computePath({ ...spec, formulation: 'if97' });
			const r95 = computePath(spec);
			expect(r.limitEvents).toHaveLength(p.events.length);
			expect(r95.limitEvents).toHaveLength(p.events.length);
			for (const ref of p.events) {
				const ev = r.limitEvents.find((e) => e.limit === ref.limit && e.leg === ref.leg);
				const ev95 = r95.limitEvents.find((e) => e.limit === ref.limit && e.leg === ref.leg);
				expect(ev, `${ref.limit} on ${ref.leg}`).toBeDefined();
				const st = ev!.state;
				const what = `${ref.limit} on ${ref.leg ?? 'the start'}`;
				expect(st.formulation, what).toBeUndefined();
				expect(rel(st.T, ref.state.T), `${what}: T ${st.T} vs ${ref.state.T}`).toBeLessThan(1e-8);
				expect(rel(st.P, ref.state.P), `${what}: P ${st.P} vs ${ref.state.P}`).toBeLessThan(1e-8);
				expect(rel(st.v, ref.state.v), `${what}: v ${st.v} vs ${ref.state.v}`).toBeLessThan(1e-7);
				expect(Math.abs(st.h - ref.state.h), `${what}: h`).toBeLessThan(1e-3);
				expect(Math.abs(st.s - ref.state.s), `${what}: s`).toBeLessThan(1e-6);
				if (ref.state.x !== null && ref.state.x > 0 && ref.state.x < 1)
					expect(Math.abs((st.x as number) - ref.state.x), `${what}: x`).toBeLessThan(1e-8);
				// the IAPWS-95 event misses the IF97 state by far more than the check's tolerance
				// (a start-beyond event is the start itself, checked above against its IF97 state)
				if (ref.leg)
					expect(
						Math.abs(ev95!.state.h - ref.state.h),
						`${what}: the IAPWS-95 event's h`
					).toBeGreaterThan(1e-2);
				// its warning says the same state
				const warning = r.warnings.find((w) => w.at === ev!.state && (w.leg ?? null) === ref.leg);
				expect(warning, `${what}: its warning`).toBeDefined();
				if (ref.leg) expect(warning!.message).toContain(ref.leg);
			}
			// one warning per event, no IAPWS-95 one left beside them
			const limitCodes = /^(design-|relief-set-pressure-(reached|exceeded)|below-minimum)/;
			expect(r.warnings.filter((w) => limitCodes.test(w.code))).toHaveLength(p.events.length);
		});

	it('a leg that does not reach a limit has no event, and an exceeded limit says so', () => {
		const spec = fixture.paths[0].spec as PathSpec;
		const r = computePath({
			...spec,
			formulation: 'if97',
			limits: { designPressure: 5e6, designTemperature: 550 }
		});
		expect(r.limitEvents.map((e) => e.limit)).toEqual(['designTemperature']);
		expect(r.limitEvents[0].exceeded).toBe(true);
		expect(r.warnings.map((w) => w.code)).toContain('design-temperature-exceeded');
		const upTo = computePath({ ...spec, formulation: 'if97', limits: { designPressure: 3e6 } });
		expect(upTo.limitEvents).toHaveLength(1);
		expect(upTo.limitEvents[0].exceeded).toBe(false);
		expect(upTo.warnings.map((w) => w.code)).toContain('design-pressure-reached');
	});
});
