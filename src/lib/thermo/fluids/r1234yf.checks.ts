import type { FluidChecks } from './checks.ts';

/**
 * R-1234yf: check values printed in Lemmon & Akasaka (2022), Int. J. Thermophys. 43, 119.
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/R1234yf.py, Test.test_lemmon), which quotes the paper's printed tables with their table and page.
 */
export const r1234yfChecks: FluidChecks = {
	fluid: 'r1234yf',
	critical: {
		source: 'Lemmon & Akasaka (2022): Tc = 367.85 K, pc = 3.3844 MPa, ρc = 4.18 mol/dm³',
		T: '367.85',
		P: '3.3844',
		rho: '4.18',
		units: ['K', 'MPa', 'mol/dm3']
	},
	tables: [
		{
			source:
				'Lemmon & Akasaka (2022), as transcribed in pychemqt lib/mEoS/R1234yf.py, Table 7, pag 27',
			input: 'T-rho',
			energies: 'absolute',
			columns: ['T [K]', 'rho [mol/dm3]', 'P [MPa]', 'cv [J/(mol K)]', 'cp [J/(mol K)]', 'w [m/s]'],
			rows: [
				// the table's ideal-gas row (280 K, ρ = 0) is left out: the engine fixes states of positive density only
				['280', '11', '28.95760', '101.930', '139.307', '738.905'],
				['280', '0.1', '0.2185345', '91.3497', '102.623', '141.882'],
				['340', '8', '2.309798', '113.805', '195.748', '265.888'],
				['340', '1', '1.855076', '113.479', '168.646', '114.354'],
				['368', '4.2', '3.394716', '149.703', '48981.3', '76.3597']
			]
		}
	]
};
