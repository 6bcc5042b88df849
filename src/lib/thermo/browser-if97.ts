/**
 * What the sheet editor adds to the browser's engine (browser.ts) for a water sheet by IAPWS-IF97:
 * its states and their extras, and its dome.
 */
export { if97Fix, if97SaturationCurve } from './water-if97.ts';
export { if97Extras } from './if97/path.ts';
