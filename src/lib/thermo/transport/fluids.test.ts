/**
 * Transport properties of the fluids other than water against the check values their publications
 * print. None of the papers could be opened here: each table is named as the paper's, and the figures
 * were read from CoolProp's src/Tests/CoolProp-Tests.cpp (commit ea27c639), where they stand under the
 * paper's name without a table number.
 */
import { describe, expect, it } from 'vitest';
import { printed } from './printed.test-support.ts';
import { fixState, transport } from '../index.ts';
import { tensionSum } from './forms.ts';
import { muleroTension } from './data/surface-tension.ts';
import { transportAt } from './index.ts';

describe('nitrogen, argon, oxygen and air: Lemmon & Jacobsen (2004), Int. J. Thermophys. 25, 21', () => {
	// Lemmon & Jacobsen (2004), their table of check values (T, ρ in mol/dm³ → η μPa·s, λ mW/(m·K)),
	// read from CoolProp's CoolProp-Tests.cpp. The ρ = 0 rows are given there as 1e−14 mol/m³.
	const M = { nitrogen: 28.01348, argon: 39.948, oxygen: 31.9988, air: 28.9586 };
	const rows: [keyof typeof M, number, number, string, string][] = [
		['nitrogen', 100, 0, '6.90349', '9.27749'],
		['nitrogen', 300, 0, '17.8771', '25.9361'],
		['nitrogen', 100, 25, '79.7418', '103.834'],
		['nitrogen', 200, 10, '21.0810', '36.0099'],
		['nitrogen', 300, 5, '20.7430', '32.7694'],
		['nitrogen', 126.195, 11.18, '18.2978', '675.800'],
		['argon', 100, 0, '8.18940', '6.36587'],
		['argon', 300, 0, '22.7241', '17.8042'],
		['argon', 100, 33, '184.232', '111.266'],
		['argon', 200, 10, '25.5662', '26.1377'],
		['argon', 300, 5, '26.3706', '23.2302'],
		['argon', 150.69, 13.4, '27.6101', '856.793'],
		['oxygen', 100, 0, '7.70243', '8.94334'],
		['oxygen', 300, 0, '20.6307', '26.4403'],
		['oxygen', 100, 35, '172.136', '146.044'],
		['oxygen', 200, 10, '22.4445', '34.6124'],
		['oxygen', 300, 5, '23.7577', '32.5491'],
		['oxygen', 154.6, 13.6, '24.7898', '377.476'],
		// air: the paper's Table V, read from CoolProp's CoolProp-Tests.cpp and, the same figures,
		// from pychemqt's lib/mEoS/Air.py (test_LemmonTransport, "Table V, pag 28")
		['air', 100, 0, '7.09559', '9.35902'],
		['air', 300, 0, '18.5230', '26.3529'],
		['air', 100, 28, '107.923', '119.221'],
		['air', 200, 10, '21.1392', '35.3185'],
		['air', 300, 5, '21.3241', '32.6062'],
		['air', 132.64, 10.4, '17.7623', '75.6231']
	];
	it('η and λ away from the critical point to the printed digits (2 units of the last)', () => {
		for (const [fluid, T, rhoMolar, mu, k] of rows.filter((r) => r[1] < 120 || r[1] > 160)) {
			const r = transportAt(fluid, T, Math.max(rhoMolar, 1e-17) * M[fluid])!;
			printed(r.mu * 1e6, mu, `${fluid} η at ${T} K, ${rhoMolar} mol/dm³`, 2);
			printed(r.k! * 1e3, k, `${fluid} λ at ${T} K, ${rhoMolar} mol/dm³`, 2);
		}
	});
	it('near the critical point, where λ is mostly the critical enhancement: η to the printed digits, λ within 2e−5', () => {
		// the enhancement takes cp, cv and (∂ρ/∂p)_T from this engine's equation of state, which agrees
		// with the paper's only to round-off of its coefficients: a few 1e−6 of λ this close to Tc
		for (const [fluid, T, rhoMolar, mu, k] of rows.filter((r) => r[1] > 120 && r[1] < 160)) {
			const r = transportAt(fluid, T, rhoMolar * M[fluid])!;
			printed(r.mu * 1e6, mu, `${fluid} η at ${T} K`, 2);
			expect(Math.abs(r.k! * 1e3 - Number(k)) / Number(k), `${fluid} λ at ${T} K`).toBeLessThan(
				2e-5
			);
		}
	});
});

describe('carbon dioxide', () => {
	it('viscosity: Laesecke & Muzny (2017), J. Phys. Chem. Ref. Data 46, 013107, check values (mPa·s)', () => {
		// Laesecke & Muzny (2017), their table of check values (T K, ρ kg/m³ → η mPa·s), read from
		// CoolProp's CoolProp-Tests.cpp
		const rows: [number, number, string][] = [
			[100, 1e-5, '0.0053757'],
			[2000, 1e-5, '0.066079'],
			[10000, 1e-5, '0.17620'],
			[220, 3, '0.011104'],
			[225, 1150, '0.22218'],
			[300, 65, '0.015563'],
			[300, 1400, '0.50594'],
			[700, 100, '0.033112'],
			[700, 1200, '0.22980']
		];
		for (const [T, rho, mu] of rows)
			printed(transportAt('carbon-dioxide', T, rho)!.mu * 1e3, mu, `η at ${T} K, ${rho} kg/m³`);
	});
	it('thermal conductivity: Huber, Sykioti, Assael & Perkins (2016), J. Phys. Chem. Ref. Data 45, 013102 (mW/(m·K))', () => {
		// Huber et al. (2016), their table of check values (T K, ρ kg/m³ → λ mW/(m·K)), read from CoolProp's
		// CoolProp-Tests.cpp; the 310 K, 400 kg/m³ row includes the critical enhancement
		const rows: [number, number, string][] = [
			[250, 1e-6, '12.99'],
			[250, 2, '13.05'],
			[250, 1058, '140.00'],
			[310, 400, '73.04']
		];
		for (const [T, rho, k] of rows)
			printed(transportAt('carbon-dioxide', T, rho)!.k! * 1e3, k, `λ at ${T} K, ${rho} kg/m³`);
	});
});

describe('ammonia viscosity: Monogenidou, Assael & Huber (2018), J. Phys. Chem. Ref. Data 47, 023102', () => {
	it('matches the values the paper quotes at 300 K (its Section 3), μPa·s', () => {
		// Monogenidou et al. (2018), Section 3, as quoted in pychemqt lib/mEoS/NH3.py (test_monogenidouVisco)
		printed(transportAt('ammonia', 300, 0)!.mu * 1e6, '10.1812', '300 K, 0 kg/m³');
		printed(transportAt('ammonia', 300, 8)!.mu * 1e6, '9.9219', '300 K, 8 kg/m³');
		printed(transportAt('ammonia', 300, 609)!.mu * 1e6, '133.3937', '300 K, 609 kg/m³');
	});
	it('a state has μ, and k and Pr absent with the reason', () => {
		const t = transport(fixState('ammonia', { T: 300, P: 2e6 }));
		expect(t.mu).toBeGreaterThan(1e-4);
		expect(t.k).toBeNull();
		expect(t.absent.k?.code).toBe('no-correlation');
		expect(t.absent.k?.reason).toMatch(/600 kg\/m³/);
		expect(t.absent.Pr?.code).toBe('no-correlation');
		expect(transport(fixState('ammonia', { T: 400, P: 60e6 })).absent.mu?.code).toBe(
			'out-of-range'
		);
	});
});

describe('R-134a viscosity: Huber, Laesecke & Perkins (2003), Ind. Eng. Chem. Res. 42, 3163', () => {
	it('on the saturation line within 1e−4 of REFPROP 9.1 (the paper prints no check values)', () => {
		// REFPROP 9.1, as given in CoolProp's src/Tests/CoolProp-Tests.cpp ("since Huber I&ECR 2003 does not
		// provide validation data"), Pa·s; the saturated densities are this engine's (Tillner-Roth & Baehr)
		const rows: [number, 0 | 1, number][] = [
			[185, 0, 0.0012698376398294414],
			[185, 1, 7.4290821400170869e-6],
			[360, 0, 7.8146319978982133e-5],
			[360, 1, 1.7140264998576107e-5]
		];
		for (const [T, x, mu] of rows) {
			const t = transport(fixState('r134a', { T, x }));
			expect(Math.abs(t.mu! / mu - 1), `${T} K, x = ${x}: ${t.mu}`).toBeLessThan(1e-4);
			// the conductivity (Perkins et al. 2000) is checked in refrigerants.test.ts
			expect(t.k).toBeGreaterThan(0);
		}
	});
});

describe('surface tension: Mulero, Cachadiña & Parra (2012), J. Phys. Chem. Ref. Data 41, 043105', () => {
	// The paper prints coefficients and fit statistics, not check values; these figures are the
	// saturated-liquid σ of the NIST Chemistry WebBook (fluid properties, from memory), which the
	// paper's correlations reproduce within their stated deviations (a few per cent)
	const rows: [string, number, number][] = [
		['nitrogen', 77.355, 8.85e-3], // from memory: N2 at its normal boiling point
		['argon', 87.302, 12.5e-3], // from memory: Ar at its normal boiling point
		['oxygen', 90.188, 13.2e-3], // from memory: O2 at its normal boiling point
		['methane', 111.67, 13.0e-3], // from memory: CH4 at its normal boiling point
		['carbon-dioxide', 273.15, 4.5e-3], // from memory: CO2 at 0 °C
		['ammonia', 239.82, 33.9e-3], // from memory: NH3 at its normal boiling point
		['r134a', 273.15, 11.6e-3] // from memory: R-134a at 0 °C
	];
	it('reproduces handbook values within 5 %', () => {
		for (const [fluid, T, sigma] of rows) {
			const s = tensionSum(muleroTension[fluid], T);
			expect(Math.abs(s - sigma) / sigma, `${fluid} at ${T} K: ${s}`).toBeLessThan(0.05);
		}
	});
	it('is zero at and above the correlation’s Tc and positive below it, for every fluid it covers', () => {
		for (const [fluid, c] of Object.entries(muleroTension)) {
			expect(tensionSum(c, c.Tc), fluid).toBe(0);
			expect(tensionSum(c, c.Tc * 0.7), fluid).toBeGreaterThan(0);
		}
	});
});

describe('transport(state) for the other fluids', () => {
	it('air has μ, k and Pr by Lemmon & Jacobsen (2004), and σ absent with the reason', () => {
		const t = transport(fixState('air', { T: 300, P: 101_325 }));
		// Lemmon & Jacobsen (2004) Table V at 300 K and ρ → 0 (above); at 1 atm the residual adds
		// a little: η a few 0.01 μPa·s above 18.5230, λ a few 0.01 mW/(m·K) above 26.3529
		expect(t.mu! * 1e6).toBeGreaterThan(18.523);
		expect(t.mu! * 1e6).toBeLessThan(18.6);
		expect(t.k! * 1e3).toBeGreaterThan(26.3529);
		expect(t.k! * 1e3).toBeLessThan(26.5);
		// from memory: air's Prandtl number near room temperature is about 0.71
		expect(t.Pr!).toBeGreaterThan(0.7);
		expect(t.Pr!).toBeLessThan(0.72);
		expect(t.sources.mu).toMatch(/Lemmon & Jacobsen \(2004\)/);
		expect(t.sigma).toBeNull();
		expect(t.absent.sigma?.code).toBe('no-correlation');
		expect(t.absent.sigma?.reason).toMatch(/mixture/);
	});

	it('a saturated liquid of nitrogen has μ, k, Pr and σ with their sources', () => {
		const t = transport(fixState('nitrogen', { T: 77.355, x: 0 }));
		expect(t.mu).toBeGreaterThan(1e-4);
		expect(t.k).toBeGreaterThan(0.1);
		expect(t.Pr).toBeGreaterThan(1);
		expect(t.sigma).toBeCloseTo(tensionSum(muleroTension.nitrogen, 77.355), 15);
		expect(t.sources.mu).toMatch(/Lemmon & Jacobsen \(2004\)/);
		expect(t.sources.sigma).toMatch(/Mulero/);
	});
	it('a fluid without viscosity and conductivity correlations says why, and still gives σ on the line', () => {
		const t = transport(fixState('r32', { T: 273.15, x: 1 }));
		expect(t.mu).toBeNull();
		expect(t.absent.mu?.code).toBe('no-correlation');
		expect(t.absent.mu?.reason).toMatch(/R-32.*one public copy/);
		expect(t.sigma).toBeGreaterThan(0);
		const ze = transport(fixState('r1234ze-e', { T: 273.15, x: 0 }));
		expect(ze.sigma).toBeNull();
		expect(ze.absent.sigma?.reason).toMatch(/disagree/);
	});
	it('carbon dioxide above 200 MPa has μ but no k (Huber et al. 2016 ends there)', () => {
		const t = transport(fixState('carbon-dioxide', { T: 400, P: 300e6 }));
		expect(t.mu).toBeGreaterThan(0);
		expect(t.k).toBeNull();
		expect(t.absent.k?.code).toBe('out-of-range');
		expect(t.absent.k?.reason).toMatch(/200 MPa/);
		expect(t.absent.Pr?.code).toBe('out-of-range');
	});
	it('a two-phase mixture has σ but no μ, k, Pr', () => {
		const t = transport(fixState('argon', { T: 100, x: 0.4 }));
		expect(t.sigma).toBeGreaterThan(0);
		expect(t.absent.mu?.code).toBe('two-phase');
	});
});
