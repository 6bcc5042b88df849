/**
 * Worked examples of the demo scenario: the invented Brindlemoor Thermal Works and its invented
 * clients' equipment. A new sheet can start from one, and the demo team is seeded with them.
 * Every name and number here is made up for illustration (SI: K, Pa absolute, m³, kg/s).
 */
import { makeDoc, newLegId } from './doc';
import type { SheetDoc, SheetLegSpec } from './types';
import type { PathLegSpec } from '$lib/thermo/types';

export interface WorkedExample {
	id: string;
	title: string;
	fluid: string;
	/** one or two sentences: what the path follows */
	story: string;
	/** fresh document (new leg ids each time) */
	build(): SheetDoc;
}

function legs(specs: Omit<PathLegSpec, 'id'>[]): SheetLegSpec[] {
	const taken: string[] = [];
	return specs.map((l) => {
		const id = newLegId(taken);
		taken.push(id);
		return { ...l, id };
	});
}

const bar = 1e5;
const atm = 101_325;

export const WORKED_EXAMPLES: readonly WorkedExample[] = [
	{
		id: 'kettle-k101',
		title: 'K-101 kettle jacket: condensing steam, then the trap',
		fluid: 'water',
		story:
			'Header steam at 5 bar g condenses in the jacket of a 300 L cooking kettle at constant pressure; the condensate then flashes through the trap into the 0.5 bar g return line.',
		build: () =>
			makeDoc({
				description:
					'Jacket side of K-101. Steam supply 5 bar g, dry saturated at the jacket inlet; 0.04 kg/s at full boil-up. Trap discharges to the condensate return at 0.5 bar g.',
				spec: {
					fluid: 'water',
					system: { kind: 'flow', massFlow: 0.04 },
					start: { P: 5 * bar + atm, x: 1 },
					legs: legs([
						{ process: 'isobaric', target: { x: 0 } },
						{ process: 'isenthalpic', target: { P: 0.5 * bar + atm } }
					]),
					limits: {
						designPressure: 6 * bar + atm,
						reliefSetPressure: 6 * bar + atm,
						designTemperature: 443.15
					}
				},
				units: { system: 'si', pressureUnit: 'bar', pressureReference: 'gauge' },
				chart: { view: 'both', pressureScale: 'log', isolines: true },
				titleBlock: {
					project: 'Hollin Vale Creamery — batch kitchen',
					equipment: 'Jacketed steam kettle, 300 L',
					tag: 'K-101',
					documentNumber: 'BTW-CALC-0142',
					site: 'Hollin Vale, north wing'
				}
			})
	},
	{
		id: 'vessel-v204-fire',
		title: 'V-204 sealed expansion vessel in a fire case',
		fluid: 'water',
		story:
			'A sealed 0.5 m³ vessel charged at 80 °C, about 82 % liquid by volume, is heated by a surrounding fire at constant volume until it runs liquid-full and its pressure climbs steeply.',
		build: () =>
			makeDoc({
				description:
					'Fire case for V-204 with both isolation valves shut. Charge: 0.5 m³ at 80 °C and a mean specific volume of 0.00125 m³/kg (about 400 kg). Shows where the vessel goes liquid-full against its design limits.',
				spec: {
					fluid: 'water',
					system: { kind: 'closed', volume: 0.5 },
					start: { T: 353.15, v: 0.00125 },
					legs: legs([{ process: 'isochoric', target: { T: 523.15 } }]),
					limits: {
						designPressure: 10 * bar + atm,
						reliefSetPressure: 10 * bar + atm,
						designTemperature: 393.15
					}
				},
				units: { system: 'si', pressureUnit: 'MPa', pressureReference: 'absolute' },
				chart: { view: 'both', pressureScale: 'log', isolines: true },
				titleBlock: {
					project: 'Marrowfield district heating — substation 3',
					equipment: 'Sealed hot-water expansion vessel',
					tag: 'V-204',
					documentNumber: 'BTW-CALC-0157',
					site: 'Marrowfield substation 3'
				}
			})
	},
	{
		id: 'receiver-r310-hot-day',
		title: 'R-310 ammonia receiver on a hot day',
		fluid: 'ammonia',
		story:
			'An isolated 2 m³ receiver, 70 % liquid by volume on a 59 °F night, warms to 113 °F in the afternoon sun at constant volume: the saturation pressure climbs toward the design pressure.',
		build: () =>
			makeDoc({
				description:
					'R-310 isolated for maintenance of the downstream valve station, with the charge trapped. Checks the pressure reached on the hottest afternoon on record at the site and how close the liquid comes to filling the shell.',
				spec: {
					fluid: 'ammonia',
					system: { kind: 'closed', volume: 2.0 },
					start: { T: 288.15, v: 0.0023 },
					legs: legs([{ process: 'isochoric', target: { T: 318.15 } }]),
					limits: {
						designPressure: 20 * bar + atm,
						reliefSetPressure: 20 * bar + atm,
						designTemperature: 328.15,
						minimumTemperature: 244.15
					}
				},
				units: { system: 'us', pressureUnit: 'kPa', pressureReference: 'gauge' },
				chart: { view: 'both', pressureScale: 'log', isolines: true },
				titleBlock: {
					project: 'Gorsebank cold store extension',
					equipment: 'Ammonia liquid receiver',
					tag: 'R-310',
					documentNumber: 'BTW-CALC-0163',
					site: 'Gorsebank, roof plant deck'
				}
			})
	},
	{
		id: 'heat-pump-hp410',
		title: 'HP-410 R-134a heat-pump loop',
		fluid: 'r134a',
		story:
			'A water-to-water heat pump recovering heat for the creamery’s wash water: compression, condensing, expansion valve and evaporator as one closed cycle, with its heating COP.',
		build: () =>
			makeDoc({
				description:
					'Ideal vapour-compression loop for HP-410 at its rating point: evaporating at 300 kPa a, condensing at 1.4 MPa a, 0.05 kg/s of R-134a. Compression taken as isentropic for a first look.',
				spec: {
					fluid: 'r134a',
					system: { kind: 'flow', massFlow: 0.05 },
					start: { P: 300_000, x: 1 },
					legs: legs([
						{ process: 'isentropic', target: { P: 1_400_000 } },
						{ process: 'isobaric', target: { x: 0 } },
						{ process: 'isenthalpic', target: { P: 300_000 } },
						{ process: 'isobaric', target: { x: 1 } }
					]),
					limits: { designPressure: 2_000_000, designTemperature: 393.15 }
				},
				units: { system: 'si', pressureUnit: 'kPa', pressureReference: 'absolute' },
				chart: { view: 'both', pressureScale: 'log', isolines: true },
				titleBlock: {
					project: 'Hollin Vale Creamery — heat recovery',
					equipment: 'Water-to-water heat pump',
					tag: 'HP-410',
					documentNumber: 'BTW-CALC-0171',
					site: 'Hollin Vale, plant room'
				}
			})
	}
];

export function workedExample(id: string): WorkedExample | undefined {
	return WORKED_EXAMPLES.find((e) => e.id === id);
}
