/**
 * Water's transport properties against the check values printed in the IAPWS releases (R12-08,
 * R15-11, R1-76(2014)) — where python3-iapws 1.5.2's docstrings carry them, named so; the rest from
 * memory of the releases' tables — and against python3-iapws's IAPWS97 class on a grid
 * (tests/reference/water-transport.json, made by tests/reference/make-water-transport.py).
 */
import { describe, expect, it } from 'vitest';
import fixture from '../../../../tests/reference/water-transport.json';
import { fixState, if97State, transport } from '../index.ts';
import {
	viscosityCriticalRegion,
	waterConductivityBackground,
	waterSurfaceTension,
	waterViscosity
} from './water.ts';

function printed(actual: number, text: string, what: string): void {
	const [mant, exp] = text.toLowerCase().split('e');
	const decimals = mant.includes('.') ? mant.split('.')[1].length : 0;
	const tol = 0.5 * 10 ** (-decimals + (exp ? Number(exp) : 0)) * (1 + 1e-9);
	expect(
		Math.abs(actual - Number(text)),
		`${what}: ${actual} vs printed ${text}`
	).toBeLessThanOrEqual(tol);
}

describe('water viscosity, IAPWS R12-08 (μ̄2 = 1)', () => {
	it("matches the release's verification values (Table 4, μ̄2 = 1), μPa·s", () => {
		// IAPWS R12-08, Table 4, as transcribed in python3-iapws 1.5.2 (_Viscosity docstring)
		printed(waterViscosity(998, 298.15) * 1e6, '889.735100', '298.15 K, 998 kg/m³');
		printed(waterViscosity(600, 873.15) * 1e6, '77.430195', '873.15 K, 600 kg/m³');
		// from memory: the other rows of IAPWS R12-08, Table 4
		const rows: [number, number, string][] = [
			[298.15, 1200, '1437.649467'],
			[373.15, 1000, '307.883622'],
			[433.15, 1, '14.538324'],
			[433.15, 1000, '217.685358'],
			[873.15, 1, '32.619287'],
			[873.15, 100, '35.802262'],
			[1173.15, 1, '44.217245'],
			[1173.15, 100, '47.640433'],
			[1173.15, 400, '64.154608']
		];
		for (const [T, rho, text] of rows)
			printed(waterViscosity(rho, T) * 1e6, text, `${T} K, ${rho} kg/m³`);
	});
});

describe('near the critical point: IAPWS-95 states at 647.35 K (R12-08 and R15-11, Table 5 of each)', () => {
	// from memory: IAPWS R12-08, Table 5 (μ, μPa·s) and IAPWS R15-11, Table 5 (λ, mW/(m·K)), both computed
	// with IAPWS-95; python3-iapws 1.5.2 (Debian), IAPWS95(T=647.35, rho=ρ).mu and .k print the same digits
	const rows: [number, string, string][] = [
		[122, '25.520677', '130.922885'],
		[222, '31.337589', '367.787459'],
		[272, '36.228143', '757.959776'],
		[322, '42.961579', '1443.75556'],
		[372, '45.688204', '650.319402'],
		[422, '49.436256', '448.883487']
	];
	it("inside R12-08's critical region (245.8 to 405.3 kg/m³) μ̄2 is applied: μ to 1e−7 and λ to 1e−6", () => {
		for (const [rho, mu, k] of rows.filter(([r]) => r > 245.8 && r < 405.3)) {
			const t = transport(fixState('water', { T: 647.35, rho }));
			// to 1e−7: the reference (∂ρ/∂p)_T at 1.5 Tc comes from R15-11's industrial Eq. 25, not IAPWS-95
			expect(Math.abs(t.mu! * 1e6 - Number(mu)) / Number(mu), `μ at ${rho} kg/m³`).toBeLessThan(
				1e-7
			);
			expect(Math.abs(t.k! * 1e3 - Number(k)) / Number(k), `λ at ${rho} kg/m³`).toBeLessThan(1e-6);
		}
	});
	it('outside it μ̄2 = 1, as industrial use allows: μ within 1 % and λ within 0.5 % of the printed values', () => {
		for (const [rho, mu, k] of rows.filter(([r]) => r < 245.8 || r > 405.3)) {
			const t = transport(fixState('water', { T: 647.35, rho }));
			expect(Math.abs(t.mu! * 1e6 - Number(mu)) / Number(mu), `μ at ${rho} kg/m³`).toBeLessThan(
				1e-2
			);
			expect(Math.abs(t.k! * 1e3 - Number(k)) / Number(k), `λ at ${rho} kg/m³`).toBeLessThan(5e-3);
		}
	});
});

describe('water thermal conductivity, IAPWS R15-11', () => {
	it("matches the release's verification values without the critical enhancement (Table 4), mW/(m·K)", () => {
		// IAPWS R15-11, Table 4 (λ̄2 = 0), as transcribed in python3-iapws 1.5.2 (_ThCond docstring)
		printed(waterConductivityBackground(998, 298.15) * 1e3, '607.712868', '298.15 K, 998 kg/m³');
		printed(waterConductivityBackground(0, 873.15) * 1e3, '79.1034659', '873.15 K, 0 kg/m³');
		// from memory: the other rows of IAPWS R15-11, Table 4
		printed(waterConductivityBackground(0, 298.15) * 1e3, '18.4341883', '298.15 K, 0 kg/m³');
		printed(waterConductivityBackground(1200, 298.15) * 1e3, '799.038144', '298.15 K, 1200 kg/m³');
	});
});

describe('water surface tension, IAPWS R1-76(2014)', () => {
	it("matches the release's values, mN/m", () => {
		// IAPWS R1-76(2014), as transcribed in python3-iapws 1.5.2 (_Tension docstring)
		printed(waterSurfaceTension(300) * 1e3, '71.6859625', '300 K');
		printed(waterSurfaceTension(450) * 1e3, '42.8914992', '450 K');
		// from memory: IAPWS R1-76(2014) table at 0.01 °C, 100 °C and 300 °C
		printed(waterSurfaceTension(273.16) * 1e3, '75.65', '0.01 °C');
		printed(waterSurfaceTension(373.15) * 1e3, '58.91', '100 °C');
		printed(waterSurfaceTension(573.15) * 1e3, '14.36', '300 °C');
		expect(waterSurfaceTension(647.096)).toBe(0);
	});
});

describe('transport(state) against python3-iapws 1.5.2 (Debian), IAPWS97 class', () => {
	it('single-phase IF97 states: μ, k and Pr to 1e−9', () => {
		// python3-iapws 1.5.2 (Debian), IAPWS97(P, T): mu, k, Prandt (its IAPWS97 class never applies μ̄2; no
		// grid state lies in R12-08's critical region, where ours does)
		expect(fixture.points.length).toBeGreaterThan(150);
		for (const p of fixture.points) {
			const st = if97State(p.P, p.T);
			const c = viscosityCriticalRegion;
			expect(st.T > c.Tmin && st.T < c.Tmax && st.rho > c.rhoMin && st.rho < c.rhoMax).toBe(false);
			const t = transport(st);
			const where = `region ${p.region}, ${p.T} K, ${p.P} Pa`;
			expect(Math.abs(t.mu! - p.mu) / p.mu, `μ at ${where}`).toBeLessThan(1e-9);
			expect(Math.abs(t.k! - p.k) / p.k, `k at ${where}`).toBeLessThan(1e-9);
			expect(Math.abs(t.Pr! - p.Pr) / p.Pr, `Pr at ${where}`).toBeLessThan(1e-9);
			expect(t.sigma).toBeNull();
			expect(t.absent.sigma?.code).toBe('not-on-saturation-line');
		}
	});
	it('saturated liquid and vapor: μ, k, Pr and σ', () => {
		// python3-iapws 1.5.2 (Debian), IAPWS97(T, x): mu, k, Prandt, sigma
		for (const p of fixture.saturated) {
			const st = if97State(p.P, p.T, { side: p.x === 1 ? 'vapor' : 'liquid' });
			expect(st.phase).toBe(p.x === 1 ? 'saturated-vapor' : 'saturated-liquid');
			const t = transport(st);
			const where = `${p.T} K, x = ${p.x}`;
			expect(Math.abs(t.mu! - p.mu) / p.mu, `μ at ${where}`).toBeLessThan(1e-8);
			expect(Math.abs(t.k! - p.k) / p.k, `k at ${where}`).toBeLessThan(1e-8);
			expect(Math.abs(t.Pr! - p.Pr) / p.Pr, `Pr at ${where}`).toBeLessThan(1e-8);
			expect(Math.abs(t.sigma! - p.sigma) / p.sigma, `σ at ${where}`).toBeLessThan(1e-12);
		}
	});
});

describe('transport(state): absences and IAPWS-95 states', () => {
	it('a two-phase mixture has σ but no μ, k, Pr; a fluid without a correlation says so', () => {
		const mix = transport(fixState('water', { T: 373.15, x: 0.5 }));
		expect(mix.sigma).toBeCloseTo(waterSurfaceTension(373.15), 15);
		expect(mix.mu).toBeNull();
		expect(mix.absent.mu?.code).toBe('two-phase');
		expect(mix.absent.k?.code).toBe('two-phase');
		expect(mix.absent.Pr?.code).toBe('two-phase');
		// R-1234ze(E) has μ, k and Pr (refrigerants.ts) but no surface-tension correlation
		const ze = transport(fixState('r1234ze-e', { T: 300, P: 1e5 }));
		expect(ze.sigma).toBeNull();
		expect(ze.absent.sigma?.code).toBe('no-correlation');
		for (const name of ['mu', 'k', 'Pr'] as const) expect(ze[name]).toBeGreaterThan(0);
	});
	it("outside the correlations' range μ, k and Pr are absent with the range in the reason", () => {
		const hot = transport(if97State(1e6, 1500));
		expect(hot.mu).toBeNull();
		expect(hot.absent.k?.code).toBe('out-of-range');
		expect(hot.absent.mu?.reason).toMatch(/1173\.15 K/);
	});
	it("an IAPWS-95 state gives μ and k within the two formulations' agreement of the IF97 figure", () => {
		// the correlations are the same; only ρ, cp, cv and w differ between IAPWS-95 and IF97 (by ~1e−4 or less away from the critical point)
		for (const [T, P] of [
			[300, 1e5],
			[500, 10e6],
			[700, 1e6],
			[900, 50e6]
		]) {
			const a = transport(fixState('water', { T, P }));
			const b = transport(if97State(P, T));
			expect(Math.abs(a.mu! - b.mu!) / b.mu!).toBeLessThan(1e-3);
			expect(Math.abs(a.k! - b.k!) / b.k!).toBeLessThan(1e-3);
			expect(a.sources.k).toMatch(/R15-11/);
		}
	});
});
