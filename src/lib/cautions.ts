/**
 * The cautions Statewright shows where results touch pressure equipment (wording per the product
 * brief). Shared by pages, exports and the README so they never drift apart.
 */
export const PRESSURE_EQUIPMENT_CAUTION =
	'These are design-exploration results. Pressure equipment and relief devices are designed, sized and approved ' +
	'under the applicable code (for example ASME BPVC Section VIII or EN 13445 for vessels; ASME BPVC Section XIII, ' +
	'ISO 4126 or API 520/521 for overpressure protection and relief devices) and local regulations, by a qualified ' +
	'engineer. Statewright supplies states and warnings, never relief sizes.';

/** Said with every liquid-full warning, whether the leg crosses into liquid or starts liquid-full. */
export const LIQUID_FULL_CAUTION =
	'Heating a liquid-full sealed vessel raises its pressure very fast.';

/** The heading the pressure-equipment caution goes under, on the screen and in every export. */
export const CAUTION_TITLE = 'Design exploration, not a design approval';
