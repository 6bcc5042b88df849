import { SHEET_DOC_VERSION, type SheetDoc, type SheetLegSpec } from '$lib/sheets/types';
import { unitPrefs } from '$lib/units';

/**
 * Sheet documents for tests of revisions, exports and notes: an invented sealed hot-water vessel
 * (V-204 of the demo scenario) heated at constant volume from a wet start, then vented.
 */
export function vesselDoc(legs?: SheetLegSpec[], overrides: Partial<SheetDoc> = {}): SheetDoc {
	return {
		version: SHEET_DOC_VERSION,
		description: 'Fire case: the sealed vessel heats at constant volume until the relief lifts.',
		spec: {
			fluid: 'water',
			system: { kind: 'closed', volume: 0.5 },
			start: { T: 353.15, x: 0.02 },
			legs: legs ?? [
				{ id: 'heat', process: 'isochoric', target: { T: 453.15 } },
				{ id: 'vent', process: 'isenthalpic', target: { P: 200_000 } }
			],
			limits: { designPressure: 1_101_325, reliefSetPressure: 1_101_325 },
			atmosphericPressure: 101_325
		},
		units: unitPrefs({ pressureReference: 'gauge' }),
		chart: { view: 'both', pressureScale: 'log', isolines: true },
		titleBlock: {
			project: 'Northgate district heating',
			equipment: 'Expansion vessel',
			tag: 'V-204',
			documentNumber: 'BTW-CALC-0417',
			site: 'Northgate plant room'
		},
		...overrides
	};
}
