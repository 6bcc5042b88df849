import type { FluidChecks } from './checks.ts';

/**
 * Argon: check values printed in Tegeler, Span & Wagner (1999), J. Phys. Chem. Ref. Data 28, 779 (on the paper's own energy convention: compared as differences).
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/Ar.py, Test.test_Tegeler), which quotes the paper's printed tables with their table and page.
 */
export const argonChecks: FluidChecks = {
	fluid: 'argon',
	critical: {
		source: 'Tegeler et al. (1999): Tc = 150.687 K, pc = 4.863 MPa, ρc = 535.6 kg/m³',
		T: '150.687',
		P: '4.863',
		rho: '535.6',
		units: ['K', 'MPa', 'kg/m3']
	},
	normalBoilingPoint: {
		source: 'Tegeler et al. (1999): normal boiling point 87.302 K',
		T: '87.302'
	},
	tables: [
		{
			source:
				'Tegeler, Span & Wagner (1999), as transcribed in pychemqt lib/mEoS/Ar.py, Selected point from Table 33, Pag 828, saturation states',
			input: 'T-sat',
			energies: 'differences',
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
					'83.8058',
					'0.068891',
					'1416.77',
					'-276.56',
					'-2.5440',
					'0.54960',
					'1.1157',
					'862.43',
					'4.0546',
					'-112.85',
					'-0.59044',
					'0.32471',
					'0.55503',
					'168.12'
				],
				[
					'90',
					'0.13351',
					'1378.63',
					'-269.61',
					'-2.4645',
					'0.52677',
					'1.1212',
					'819.45',
					'7.4362',
					'-110.55',
					'-0.69718',
					'0.33094',
					'0.57569',
					'172.83'
				],
				[
					'120',
					'1.213',
					'1162.82',
					'-233.48',
					'-2.1274',
					'0.45763',
					'1.3324',
					'584.19',
					'60.144',
					'-106.71',
					'-1.0710',
					'0.38934',
					'0.86265',
					'185.09'
				],
				[
					'150',
					'4.7346',
					'680.43',
					'-173.01',
					'-1.7145',
					'0.70603',
					'23.582',
					'174.74',
					'394.50',
					'-143.60',
					'-1.5185',
					'0.82182',
					'35.468',
					'157.01'
				]
			]
		},
		{
			source:
				'Tegeler, Span & Wagner (1999), as transcribed in pychemqt lib/mEoS/Ar.py, Selected points from Table 34, Pag 830, Single phase points',
			input: 'T-P',
			energies: 'differences',
			columns: [
				'T [K]',
				'P [Pa]',
				'rho [kg/m3]',
				'u [kJ/kg]',
				'h [kJ/kg]',
				's [kJ/(kg K)]',
				'cv [kJ/(kg K)]',
				'cp [kJ/(kg K)]',
				'w [m/s]'
			],
			rows: [
				[
					'83.814',
					'100000',
					'1416.80',
					'-276.61',
					'-276.54',
					'-2.5440',
					'0.54961',
					'1.1156',
					'862.52'
				],
				['700', '100000', '0.68619', '63.355', '209.09', '0.44677', '0.31223', '0.5205', '492.95'],
				[
					'150',
					'500000',
					'16.605',
					'-110.45',
					'-80.334',
					'-0.70404',
					'0.32098',
					'0.55987',
					'224.97'
				],
				[
					'170',
					'1000000',
					'29.723',
					'-105.62',
					'-71.972',
					'-0.78987',
					'0.32356',
					'0.57801',
					'238.88'
				],
				[
					'125',
					'2000000',
					'1122.34',
					'-228.45',
					'-226.66',
					'-2.0773',
					'0.45179',
					'1.4048',
					'544.65'
				],
				[
					'135',
					'3000000',
					'1020.52',
					'-214.63',
					'-211.69',
					'-1.9694',
					'0.44845',
					'1.7159',
					'445.83'
				],
				[
					'150',
					'4000000',
					'209.45',
					'-134.47',
					'-115.38',
					'-1.3116',
					'0.46106',
					'1.8982',
					'193.39'
				],
				[
					'675',
					'5000000',
					'35.123',
					'53.149',
					'195.50',
					'-0.38989',
					'0.31374',
					'0.52898',
					'493.26'
				],
				[
					'400',
					'10000000',
					'119.43',
					'-40.267',
					'43.464',
					'-0.82699',
					'0.32049',
					'0.57843',
					'391.51'
				],
				[
					'110',
					'100000000',
					'1494.28',
					'-268.41',
					'-201.49',
					'-2.4764',
					'0.56101',
					'0.94752',
					'1074.3'
				],
				[
					'330',
					'1000000000',
					'1764.39',
					'-144.17',
					'422.60',
					'-2.0896',
					'0.55397',
					'0.75591',
					'1851.9'
				]
			]
		}
	]
};
