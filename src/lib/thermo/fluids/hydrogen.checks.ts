import type { FluidChecks } from './checks.ts';

/**
 * Normal hydrogen: check values printed in Leachman et al. (2009), J. Phys. Chem. Ref. Data 38, 721 (NBP convention, as ours).
 * Tables transcribed by tests/reference/transcribe-pychemqt-checks.py from the public pychemqt repository
 * (jjgomera/pychemqt, lib/mEoS/H2.py, Test.test_leachman), which quotes the paper's printed tables with their table and page.
 */
export const hydrogenChecks: FluidChecks = {
	fluid: 'hydrogen',
	critical: {
		source: 'Leachman et al. (2009): Tc = 33.145 K, pc = 1.2964 MPa, ρc = 15.508 mol/dm³',
		T: '33.145',
		P: '1.2964',
		rho: '15.508',
		units: ['K', 'MPa', 'mol/dm3'],
		rel: 1e-4
	},
	// the equation gives 1.29648 MPa at the published Tc, ρc (6.5e-5 above pc) while it reproduces Table 14 to its printed digits up to 33 K
	normalBoilingPoint: {
		source: 'Leachman et al. (2009): normal boiling point 20.369 K',
		T: '20.369'
	},
	tables: [
		{
			source:
				'Leachman et al. (2009), as transcribed in pychemqt lib/mEoS/H2.py, Selected point from Table 14, Pag 746, saturation states',
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
				'cvL [kJ/(kg K)]',
				'cvV [kJ/(kg K)]',
				'cpL [kJ/(kg K)]',
				'cpV [kJ/(kg K)]',
				'wL [m/s]',
				'wV [m/s]'
			],
			rows: [
				[
					'13.957',
					'7.358',
					'77.004',
					'0.12985',
					'-53.926',
					'399.83',
					'-3.0723',
					'29.438',
					'5.1616',
					'6.2433',
					'7.0212',
					'10.564',
					'1269.2',
					'307.14'
				],
				[
					'20',
					'90.717',
					'71.265',
					'1.2059',
					'-3.6672',
					'446.64',
					'-0.17429',
					'22.341',
					'5.6369',
					'6.4343',
					'9.5697',
					'11.892',
					'1129.1',
					'354.31'
				],
				[
					'30',
					'804.32',
					'54.538',
					'10.445',
					'140.30',
					'441.19',
					'5.0661',
					'15.096',
					'6.3535',
					'7.4945',
					'25.284',
					'30.425',
					'713.07',
					'379.07'
				],
				[
					'33',
					'1269.3',
					'38.079',
					'24.637',
					'255.69',
					'343.40',
					'8.3842',
					'11.042',
					'7.6982',
					'8.5381',
					'484.58',
					'604.72',
					'423.53',
					'373.93'
				]
			]
		}
	]
};
