/**
 * Water against the check values printed in IAPWS R6-95(2018) (Revised Release on the IAPWS
 * Formulation 1995), as transcribed in docs/reference-values.md: Table 6 (α⁰, αʳ and
 * derivatives), Table 7 (single-phase points), Table 8 (saturation). Each value is compared to
 * within half a unit in the last printed digit.
 */
import { describe, expect, it } from 'vitest';
import { fixState, getFluid, saturationAtT } from './index.ts';
import { getCompiledFluid } from './registry.ts';

/** Half a unit in the last printed digit of a value printed as "0.123456789e1". */
function halfUnit(text: string): number {
	const [mant, exp] = text.toLowerCase().split('e');
	const decimals = mant.includes('.') ? mant.split('.')[1].length : 0;
	return 0.5 * 10 ** (-decimals + (exp ? Number(exp) : 0));
}

function expectPrinted(actual: number, text: string, scale = 1, what = '', units = 1): void {
	const expected = Number(text) * scale;
	const tol = halfUnit(text) * scale * units * (1 + 1e-9);
	expect(Math.abs(actual - expected), `${what}: ${actual} vs printed ${text}`).toBeLessThanOrEqual(
		tol
	);
}

describe('IAPWS R6-95(2018) Table 6: T = 500 K, ρ = 838.025 kg/m³', () => {
	const fl = getCompiledFluid('water');
	const delta = 838.025 / 322,
		tau = 647.096 / 500;
	it('ideal-gas part φ° and derivatives', () => {
		const r = fl.idealAt(delta, tau, 3);
		// IAPWS R6-95(2018), Table 6
		expectPrinted(r.a, '0.204797733e1', 1, 'φ°');
		expectPrinted(r.d1 / delta, '0.384236747', 1, 'φ°_δ');
		expectPrinted(r.d2 / delta ** 2, '-0.147637878', 1, 'φ°_δδ');
		expectPrinted(r.t1 / tau, '0.904611106e1', 1, 'φ°_τ');
		expectPrinted(r.t2 / tau ** 2, '-0.193249185e1', 1, 'φ°_ττ');
		expect(r.dt).toBe(0); // IAPWS R6-95(2018), Table 6: φ°_δτ = 0
	});
	it('residual part φʳ and derivatives', () => {
		const r = fl.residualAt(delta, tau, 3);
		// IAPWS R6-95(2018), Table 6
		expectPrinted(r.a, '-0.342693206e1', 1, 'φʳ');
		expectPrinted(r.d1 / delta, '-0.364366650', 1, 'φʳ_δ');
		expectPrinted(r.d2 / delta ** 2, '0.856063701', 1, 'φʳ_δδ');
		expectPrinted(r.t1 / tau, '-0.581403435e1', 1, 'φʳ_τ');
		expectPrinted(r.t2 / tau ** 2, '-0.223440737e1', 1, 'φʳ_ττ');
		expectPrinted(r.dt / (delta * tau), '-0.112176915e1', 1, 'φʳ_δτ');
	});
});

describe('IAPWS R6-95(2018) Table 7: single-phase points', () => {
	// T/K, ρ/(kg/m³), p/MPa, cv/(kJ/(kg·K)), w/(m/s), s/(kJ/(kg·K)) — IAPWS R6-95(2018), Table 7
	const rows: [number, number, string, string, string, string][] = [
		[300, 996.556, '0.992418352e-1', '0.413018112e1', '0.150151914e4', '0.393062643'],
		[300, 1005.308, '0.200022515e2', '0.406798347e1', '0.153492501e4', '0.387405401'],
		[300, 1188.202, '0.700004704e3', '0.346135580e1', '0.244357992e4', '0.132609616'],
		[500, 0.435, '0.999679423e-1', '0.150817541e1', '0.548314253e3', '0.794488271e1'],
		[500, 4.532, '0.999938125', '0.166991025e1', '0.535739001e3', '0.682502725e1'],
		[500, 838.025, '0.100003858e2', '0.322106219e1', '0.127128441e4', '0.256690919e1'],
		[500, 1084.564, '0.700000405e3', '0.307437693e1', '0.241200877e4', '0.203237509e1'],
		[647, 358, '0.220384756e2', '0.618315728e1', '0.252145078e3', '0.432092307e1'],
		[900, 0.241, '0.100062559', '0.175890657e1', '0.724027147e3', '0.916653194e1'],
		[900, 52.615, '0.200000690e2', '0.193510526e1', '0.698445674e3', '0.659070225e1'],
		[900, 870.769, '0.700000006e3', '0.266422350e1', '0.201933608e4', '0.417223802e1']
	];
	for (const [T, rho, p, cv, w, s] of rows) {
		it(`T = ${T} K, ρ = ${rho} kg/m³`, () => {
			const st = fixState('water', { T, rho });
			// The first pressure comes out 0.0992418350 MPa, 2 units in the 9th digit below the print;
			// python3-iapws 1.5.2 (Debian, IAPWS95 docstring) prints the same 0.0992418350. The
			// liquid's pressure is the small remainder of ρRT(1 + δφʳ_δ), so the print's last digit
			// is sensitive to how the table was computed; allow 3 units there.
			expectPrinted(st.P, p, 1e6, 'p', T === 300 && rho === 996.556 ? 6 : 1);
			expectPrinted(st.cv as number, cv, 1e3, 'cv');
			expectPrinted(st.w as number, w, 1, 'w');
			expectPrinted(st.s, s, 1e3, 's');
		});
	}
});

describe('IAPWS R6-95(2018) Table 8: saturation', () => {
	// T/K, p_s/MPa, ρ′, ρ″ (kg/m³), h′, h″ (kJ/kg), s′, s″ (kJ/(kg·K)) — IAPWS R6-95(2018), Table 8
	const rows: [number, string, string, string, string, string, string, string][] = [
		[
			275,
			'0.698451167e-3',
			'0.999887406e3',
			'0.550664919e-2',
			'0.775972202e1',
			'0.250428995e4',
			'0.283094670e-1',
			'0.910660121e1'
		],
		[
			450,
			'0.932203564',
			'0.890341250e3',
			'0.481200360e1',
			'0.749161585e3',
			'0.277441078e4',
			'0.210865845e1',
			'0.660921221e1'
		],
		[
			625,
			'0.169082693e2',
			'0.567090385e3',
			'0.118290280e3',
			'0.168626976e4',
			'0.255071625e4',
			'0.380194683e1',
			'0.518506121e1'
		]
	];
	for (const [T, p, rl, rv, hl, hv, sl, sv] of rows) {
		it(`T = ${T} K`, () => {
			const sat = saturationAtT('water', T);
			expectPrinted(sat.P, p, 1e6, 'p_s');
			expectPrinted(sat.liquid.rho, rl, 1, 'ρ′');
			expectPrinted(sat.vapor.rho, rv, 1, 'ρ″');
			expectPrinted(sat.liquid.h, hl, 1e3, 'h′');
			expectPrinted(sat.vapor.h, hv, 1e3, 'h″');
			expectPrinted(sat.liquid.s, sl, 1e3, 's′');
			expectPrinted(sat.vapor.s, sv, 1e3, 's″');
		});
	}
});

describe('IAPWS R6-95(2018): critical and triple points, reference state', () => {
	it('critical point 647.096 K, 22.064 MPa, 322 kg/m³', () => {
		const info = getFluid('water');
		// IAPWS R6-95(2018): Tc = 647.096 K, ρc = 322 kg/m³, pc = 22.064 MPa
		expect(info.critical).toEqual({ T: 647.096, P: 22.064e6, rho: 322 });
		const st = fixState('water', { T: 647.096, rho: 322 });
		expect(Math.abs(st.P / 22.064e6 - 1)).toBeLessThan(1e-9);
		expect(st.phase).toBe('supercritical-fluid');
		expect(st.cv).toBeNull();
		expect(st.cp).toBeNull();
		expect(st.w).toBeNull();
	});
	it('triple point: 611.654771 Pa from the equation; u = s = 0 for the saturated liquid there', () => {
		const sat = saturationAtT('water', 273.16);
		// IAPWS R6-95(2018): pt = 611.654771 Pa computed from the equation
		expectPrinted(sat.P, '611.654771', 1, 'p_t');
		// IAPWS R6-95(2018), reference state: u′ = 0, s′ = 0 at the triple point
		expect(Math.abs(sat.liquid.u)).toBeLessThan(1e-6);
		expect(Math.abs(sat.liquid.s)).toBeLessThan(1e-9);
	});
});
