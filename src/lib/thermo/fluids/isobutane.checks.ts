import type { FluidChecks } from './checks.ts';

/**
 * Isobutane: check values printed in Bücker & Wagner (2006), J. Phys. Chem. Ref. Data 35, 929 (on the paper's own energy convention: compared as differences).
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/iC4.py, Test.test_buecker), which quotes the paper's printed tables with their table and page.
 */
export const isobutaneChecks: FluidChecks = {
	fluid: 'isobutane',
	critical: {
		source: 'Bücker & Wagner (2006): Tc = 407.81 K, pc = 3.629 MPa, ρc = 225.5 kg/m³',
		T: '407.81',
		P: '3.629',
		rho: '225.5',
		units: ['K', 'MPa', 'kg/m3']
	},
	normalBoilingPoint: {
		source: 'Bücker & Wagner (2006): normal boiling point 261.401 K (as carried by pychemqt)',
		T: '261.401'
	},
	tables: [
		{
			source:
				'Bücker & Wagner (2006), as transcribed in pychemqt lib/mEoS/iC4.py, Selected point from Table 46, Pag 996, saturation state',
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
					'114',
					'0.00000002',
					'740.08373',
					'-713.59',
					'-3.195',
					'1.175',
					'1.690',
					'1997.42',
					'0.0000015',
					'-233.11',
					'1.020',
					'0.738',
					'0.881',
					'139.53'
				],
				[
					'150',
					'0.000024',
					'706.038',
					'-650.69',
					'-2.716',
					'1.251',
					'1.805',
					'1714.39',
					'0.00111',
					'-198.52',
					'0.299',
					'0.894',
					'1.037',
					'157.76'
				],
				[
					'200',
					'0.003814',
					'657.706',
					'-556.44',
					'-2.175',
					'1.363',
					'1.968',
					'1389.12',
					'0.13378',
					'-142.03',
					'-0.103',
					'1.095',
					'1.241',
					'179.38'
				],
				[
					'300',
					'0.37000',
					'548.32',
					'-338.17',
					'-1.299',
					'1.690',
					'2.442',
					'810.25',
					'9.6096',
					'-11.29',
					'-0.209',
					'1.578',
					'1.810',
					'197.74'
				],
				[
					'400',
					'3.1856',
					'341.03',
					'-36.27',
					'-0.459',
					'2.250',
					'6.349',
					'184.38',
					'118.39',
					'81.59',
					'-0.164',
					'2.354',
					'7.555',
					'128.90'
				],
				[
					'407',
					'3.5801',
					'276.83',
					'7.30',
					'-0.354',
					'2.465',
					'42.319',
					'116.97',
					'173.46',
					'59.64',
					'-0.225',
					'2.575',
					'61.185',
					'113.83'
				]
			]
		},
		{
			source:
				'Bücker & Wagner (2006), as transcribed in pychemqt lib/mEoS/iC4.py, Selected point from Table 47, Pag 1003',
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
				['115', '100000', '739.18', '-711.91', '-711.78', '-3.1801', '1.1769', '1.6927', '1988.81'],
				['320', '500000', '12.322', '-20.015', '20.563', '-0.14464', '1.6742', '1.9171', '201.39'],
				['330', '1000000', '508.12', '-263.45', '-261.48', '-1.0589', '1.8167', '2.6701', '644.33'],
				['575', '2000000', '25.769', '537.11', '614.72', '1.0085', '2.7190', '2.9159', '280.39'],
				[
					'190',
					'5000000',
					'670.90',
					'-577.98',
					'-570.53',
					'-2.2856',
					'1.3443',
					'1.9257',
					'1477.48'
				],
				[
					'120',
					'10000000',
					'738.15',
					'-705.41',
					'-691.86',
					'-3.1247',
					'1.2021',
					'1.7037',
					'1969.38'
				],
				[
					'230',
					'30000000',
					'652.07',
					'-510.55',
					'-464.54',
					'-1.9602',
					'1.4740',
					'2.0224',
					'1398.87'
				]
			]
		}
	]
};
