import type { FluidChecks } from './checks.ts';

/**
 * R-1234ze(E): check values printed in Thol & Lemmon (2016), Int. J. Thermophys. 37, 28.
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/R1234zeE.py, Test.test_thol), which quotes the paper's printed tables with their table and page.
 */
export const r1234zeEChecks: FluidChecks = {
	fluid: 'r1234ze-e',
	critical: {
		source: 'Thol & Lemmon (2016): Tc = 382.513 K, pc = 3.6349 MPa, ρc = 4.29 mol/dm³',
		T: '382.513',
		P: '3.6349',
		rho: '4.29',
		units: ['K', 'MPa', 'mol/dm3']
	},
	// no normal boiling point check: the 254.177 K pychemqt carries is not a printed value of the paper (the equation gives 254.1775 K)
	tables: [
		{
			source:
				'Thol & Lemmon (2016), as transcribed in pychemqt lib/mEoS/R1234zeE.py, Table 3, pag 15',
			input: 'T-rho',
			energies: 'absolute',
			columns: ['T [K]', 'rho [mol/dm3]', 'P [MPa]', 'cv [J/(mol K)]', 'cp [J/(mol K)]', 'w [m/s]'],
			rows: [
				['200', '12.6', '2.161400', '94.9481', '139.161', '982.461'],
				['350', '11.4', '95.04156', '112.495', '144.400', '902.540'],
				['383', '4.29', '3.670105', '151.107', '17431.1', '79.9438'],
				// the table's ideal-gas row (200 K, ρ = 0) is left out: the engine fixes states of positive density only
				['360', '1', '2.039103', '113.342', '161.395', '122.236'],
				['420', '8', '19.95447', '120.029', '169.513', '371.320']
			]
		}
	]
};
