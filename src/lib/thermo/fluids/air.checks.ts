import type { CheckTable } from './checks.ts';

/**
 * Air: check values printed in Lemmon, Jacobsen, Penoncello & Friend (2000), J. Phys. Chem. Ref. Data
 * 29, 331, as quoted (with table and page) by the public pychemqt repository (jjgomera/pychemqt,
 * lib/mEoS/Air.py, Test.test_lemmon). Energies are on the paper's own convention (the ideal-gas
 * constants as published), so they are compared as printed.
 * Not in checked-fluids.ts: air is not registered (see air.ts); air.test.ts runs these.
 */
export const airSinglePhase: CheckTable = {
	source:
		'Lemmon et al. (2000), as transcribed in pychemqt lib/mEoS/Air.py, Selected point from Table A2, Pag 366, single phase',
	input: 'T-P',
	energies: 'absolute',
	columns: [
		'T [K]',
		'P [MPa]',
		'rho [mol/dm3]',
		'u [J/mol]',
		'h [J/mol]',
		's [J/(mol K)]',
		'cv [J/(mol K)]',
		'cp [J/(mol K)]',
		'w [m/s]'
	],
	rows: [
		['100', '0.101325', '0.12449', '2028.2', '2842.1', '166.61', '21.09', '30.13', '198.2'],
		['500', '0.2', '0.048077', '10418', '14578', '208.20', '21.51', '29.84', '446.6'],
		['130', '1', '1.0295', '2461.1', '3432.5', '153.79', '22.05', '34.69', '216.8'],
		['2000', '10', '0.59094', '48600', '65522', '221.44', '27.93', '36.25', '878.6'],
		['2000', '500', '16.48', '48857', '79198', '188.66', '29.07', '37.27', '1497.6']
	]
};

/**
 * Bubble- and dew-point pressures printed in Table A1 (Lemmon et al. 2000, p. 363), as quoted by
 * pychemqt lib/mEoS/Air.py (Test.test_lemmon): T [K], bubble P [MPa], dew P [MPa].
 */
export const airBubbleDew = {
	source:
		'Lemmon et al. (2000), as transcribed in pychemqt lib/mEoS/Air.py, Selected point from Table A1, Pag 363',
	rows: [
		['59.75', '0.005265', '0.00243'],
		['70', '0.03191', '0.01943'],
		['80', '0.11462', '0.08232'],
		['100', '0.66313', '0.56742'],
		['120', '2.15573', '2.00674'],
		['130', '3.42947', '3.30835']
	]
};
