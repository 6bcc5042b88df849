/**
 * The cautions said wherever results touch pressure equipment. Their one home: the engine attaches
 * them to warnings, and the app (src/lib/cautions.ts) shows the same words on pages and in exports.
 */
export const PRESSURE_EQUIPMENT_CAUTION =
	'These are design-exploration results. Pressure equipment and relief devices are designed, sized and approved ' +
	'under the applicable code (for example ASME BPVC Section VIII or EN 13445 for vessels; ASME BPVC Section XIII, ' +
	'ISO 4126 or API 520/521 for overpressure protection and relief devices) and local regulations, by a qualified ' +
	'engineer. Statewright supplies states and warnings, never relief sizes.';

/** Said with every liquid-full warning, whether the leg crosses into liquid or starts liquid-full. */
export const LIQUID_FULL_CAUTION =
	'Heating a liquid-full sealed vessel raises its pressure very fast.';
