import type { FluidChecks } from './checks.ts';

/**
 * Propane: check values printed in Lemmon, McLinden & Wagner (2009), J. Chem. Eng. Data 54, 3141.
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/C3.py, Test.test_lemmon), which quotes the paper's printed tables with their table and page.
 */
export const propaneChecks: FluidChecks = {
	fluid: 'propane',
	critical: {
		source: 'Lemmon et al. (2009): Tc = 369.89 K, pc = 4.2512 MPa, ρc = 5.00 mol/dm³',
		T: '369.89',
		P: '4.2512',
		rho: '5.00',
		units: ['K', 'MPa', 'mol/dm3']
	},
	normalBoilingPoint: {
		source: 'Lemmon et al. (2009): normal boiling point 231.036 K',
		T: '231.036'
	},
	tables: [
		{
			source:
				'Lemmon, McLinden & Wagner (2009), as transcribed in pychemqt lib/mEoS/C3.py, Table 5, pag 3174',
			input: 'T-rho',
			energies: 'absolute',
			columns: ['T [K]', 'rho [mol/dm3]', 'P [MPa]', 'cv [J/(mol K)]', 'cp [J/(mol K)]', 'w [m/s]'],
			rows: [
				['200', '14', '2.3795138', '61.078424', '93.475362', '1381.9552'],
				['300', '12', '19.053797', '73.972542', '108.61529', '958.40520'],
				['300', '0.4', '0.84694991', '69.021875', '85.753997', '221.88959'],
				['400', '5', '6.6462840', '97.017439', '271.07044', '194.65847'],
				['369.9', '5', '4.2519399', '117.71621', '753625.00', '130.89800']
			]
		},
		{
			source:
				'Lemmon, McLinden & Wagner (2009), as transcribed in pychemqt lib/mEoS/C3.py, Selected point from Table A1, Pag 3175, saturation state',
			input: 'T-sat',
			energies: 'absolute',
			columns: [
				'T [K]',
				'P [MPa]',
				'rhoL [kg/m3]',
				'hL [kJ/kg]',
				'sL [kJ/(kg K)]',
				'cvL [kJ/(kg K)]',
				'cpL [kJ/(kg K)]',
				'wL [m/s]',
				'rhoV [kg/m3]',
				'hV [kJ/kg]',
				'sV [kJ/(kg K)]',
				'cvV [kJ/(kg K)]',
				'cpV [kJ/(kg K)]',
				'wV [m/s]'
			],
			rows: [
				[
					'223.15',
					'0.070569',
					'589.90',
					'82.753',
					'0.5298',
					'1.428',
					'2.212',
					'1212.5',
					'1.7270',
					'516.48',
					'2.473',
					'1.182',
					'1.397',
					'216.5'
				],
				[
					'323.15',
					'1.7133',
					'448.87',
					'336.80',
					'1.450',
					'1.780',
					'3.089',
					'546.8',
					'38.630',
					'621.66',
					'2.332',
					'1.753',
					'2.499',
					'202.2'
				]
			]
		}
	]
};
