import type { FluidChecks } from './checks.ts';

/**
 * check values printed in Tillner-Roth & Yokozeki (1997), J. Phys. Chem. Ref. Data 26, 1273.
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/R32.py, Test.test_tillner), which quotes the paper's printed tables with their table and page.
 */
export const r32Checks: FluidChecks = {
	fluid: 'r32',
	critical: {
		// the equation gives 5.7826 MPa at the published Tc and ρc (0.011 % above the published pc) while it reproduces the
		// paper's saturation table up to 78 °C (Table 12, 5769.7 kPa) to the printed digits: a property of the equation
		source: 'Tillner-Roth & Yokozeki (1997): Tc = 351.255 K, pc = 5.782 MPa, ρc = 424 kg/m³',
		T: '351.255',
		P: '5.782',
		rho: '424',
		units: ['K', 'MPa', 'kg/m3'],
		rel: 1.5e-4
	},
	normalBoilingPoint: {
		source:
			'Tillner-Roth & Yokozeki (1997): normal boiling point 221.499 K (as carried by pychemqt)',
		T: '221.499'
	},
	tables: [
		{
			source:
				'Tillner-Roth & Yokozeki (1997), as transcribed in pychemqt lib/mEoS/R32.py, Selected point from Table 12, Pag 1293, saturation state',
			input: 'T-sat',
			energies: 'absolute',
			columns: [
				'T [K]',
				'P [kPa]',
				'rhoL [kg/m3]',
				'rhoV [kg/m3]',
				'hL [kJ/kg]',
				'hV [kJ/kg]',
				'sL [kJ/(kg K)]',
				'sV [kJ/(kg K)]',
				'cpL [kJ/(kg K)]',
				'cpV [kJ/(kg K)]'
			],
			rows: [
				[
					'136.34',
					'0.05',
					'1429.3',
					'0.0022',
					'-19.07',
					'444.31',
					'-0.1050',
					'3.2937',
					'1.592',
					'0.660'
				],
				[
					'173.15',
					'3.81',
					'1339.0',
					'0.1385',
					'38.83',
					'468.31',
					'0.2711',
					'2.7515',
					'1.560',
					'0.703'
				],
				[
					'223.15',
					'110.14',
					'1208.4',
					'3.2316',
					'117.22',
					'497.27',
					'0.6683',
					'2.3714',
					'1.589',
					'0.883'
				],
				[
					'273.15',
					'813.10',
					'1055.3',
					'22.0910',
					'200.00',
					'515.30',
					'1.0000',
					'2.1543',
					'1.745',
					'1.251'
				],
				[
					'323.15',
					'3141.2',
					'839.26',
					'98.550',
					'297.49',
					'507.10',
					'1.3183',
					'1.9670',
					'2.439',
					'2.477'
				],
				[
					'347.15',
					'5304.6',
					'624.57',
					'240.12',
					'367.53',
					'466.41',
					'1.5179',
					'1.8027',
					'8.052',
					'12.094'
				],
				['351.15', '5769.7', '484.61', '367.24', '400.38', '428.90', '1.6095', '1.6907', '', '']
			]
		},
		{
			source:
				'Tillner-Roth & Yokozeki (1997), as transcribed in pychemqt lib/mEoS/R32.py, Table 13, pag. 1295',
			input: 'P-sat',
			energies: 'absolute',
			columns: [
				'P [Pa]',
				'T [degC]',
				'rhoL [kg/m3]',
				'rhoV [kg/m3]',
				'hL [kJ/kg]',
				'hV [kJ/kg]',
				'sL [kJ/(kg K)]',
				'sV [kJ/(kg K)]',
				'cpL [kJ/(kg K)]',
				'cpV [kJ/(kg K)]'
			],
			rows: [
				[
					'100000',
					'-51.91',
					'1213.6',
					'2.9512',
					'114.18',
					'496.32',
					'0.6546',
					'2.3819',
					'1.587',
					'0.873'
				],
				[
					'5000000',
					'71.18',
					'666.31',
					'207.51',
					'356.00',
					'476.27',
					'1.4859',
					'1.8352',
					'5.428',
					'7.607'
				]
			]
		},
		{
			source:
				'Tillner-Roth & Yokozeki (1997), as transcribed in pychemqt lib/mEoS/R32.py, Selected point from Table 14, Pag 1297, single phase region',
			input: 'T-P',
			energies: 'absolute',
			columns: ['T [K]', 'P [Pa]', 'rho [kg/m3]', 'h [kJ/kg]', 's [kJ/(kg K)]'],
			rows: [
				['188.15', '10000', '0.3354', '478.09', '2.6526'],
				['198.15', '20000', '0.6401', '484.34', '2.5754'],
				['433.15', '50000', '0.7234', '687.70', '3.0905'],
				['218.15', '100000', '1222.2', '109.29', '0.6324'],
				['273.15', '200000', '4.7455', '536.37', '2.4378'],
				['248.15', '300000', '8.2165', '509.91', '2.2747'],
				['378.15', '500000', '8.4945', '627.61', '2.5771'],
				['278.15', '1000000', '1038.0', '208.80', '1.0313'],
				['188.15', '2000000', '1303.6', '63.18', '0.3976'],
				['433.15', '3000000', '47.926', '662.45', '2.3927'],
				['343.15', '5000000', '689.76', '350.24', '1.4692'],
				['318.15', '10000000', '930.32', '280.50', '1.2414'],
				['188.15', '20000000', '1323.9', '72.12', '0.3723'],
				['433.15', '40000000', '760.12', '475.86', '1.6700']
			]
		},
		{
			source:
				'Tillner-Roth & Yokozeki (1997), as transcribed in pychemqt lib/mEoS/R32.py, Table 15, Pag 1319, isobaric heat capacity',
			input: 'T-P',
			energies: 'absolute',
			columns: ['T [K]', 'P [Pa]', 'cp [kJ/(kg K)]'],
			rows: [
				['188.15', '20000', '1.559'],
				['433.15', '6000000', '1.412'],
				['273.15', '50000000', '1.518']
			]
		},
		{
			source:
				'Tillner-Roth & Yokozeki (1997), as transcribed in pychemqt lib/mEoS/R32.py, Table 16, Pag 1322, isochoric heat capacity',
			input: 'T-P',
			energies: 'absolute',
			columns: ['T [K]', 'P [Pa]', 'cv [kJ/(kg K)]'],
			rows: [
				['188.15', '20000', '0.970'],
				['433.15', '6000000', '0.976'],
				['273.15', '50000000', '0.949']
			]
		},
		{
			source:
				'Tillner-Roth & Yokozeki (1997), as transcribed in pychemqt lib/mEoS/R32.py, Table 17, Pag 1325, speed of sound',
			input: 'T-P',
			energies: 'absolute',
			columns: ['T [K]', 'P [Pa]', 'w [m/s]'],
			rows: [
				['188.15', '20000', '1143.4'],
				['433.15', '6000000', '254.16'],
				['273.15', '50000000', '989.78']
			]
		}
	]
};
