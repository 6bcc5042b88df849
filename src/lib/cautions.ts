/**
 * The cautions Statewright shows where results touch pressure equipment. The words live in the
 * engine (src/lib/thermo/cautions.ts), which attaches them to its warnings; pages and exports take
 * them from here so they never drift apart.
 */
export { LIQUID_FULL_CAUTION, PRESSURE_EQUIPMENT_CAUTION } from '$lib/thermo/cautions';

/** The heading the pressure-equipment caution goes under, on the screen and in every export. */
export const CAUTION_TITLE = 'Design exploration, not a design approval';
