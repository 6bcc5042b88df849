import type { FluidChecks } from './checks.ts';

/**
 * Oxygen: check values printed in Schmidt & Wagner (1985), Fluid Phase Equilibria 19, 175, as quoted
 * (with table and page) by the public pychemqt repository (jjgomera/pychemqt, lib/mEoS/O2.py,
 * Test.test_schmidt). The ideal-gas part is checked apart, in oxygen.test.ts.
 */
export const oxygenChecks: FluidChecks = {
	fluid: 'oxygen',
	critical: {
		source: 'Schmidt & Wagner (1985): Tc = 154.581 K, pc = 5.043 MPa, ρc = 13.63 mol/dm³',
		T: '154.581',
		P: '5.043',
		rho: '13.63',
		units: ['K', 'MPa', 'mol/dm3']
	},
	tables: [
		{
			source:
				'Schmidt & Wagner (1985), as transcribed in pychemqt lib/mEoS/O2.py, Table 4 pag 191, Saturation densities',
			input: 'T-sat',
			energies: 'absolute',
			columns: ['T [K]', 'rhoL [mol/dm3]', 'rhoV [mol/dm3]'],
			rows: [
				['150', '21.1096', '6.71701'],
				['154.515', '15.0637', '11.9252'],
				['154.565', '14.4607', '12.3876']
			]
		}
	]
};
