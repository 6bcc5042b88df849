/**
 * The engine as the sheet editor loads it into the browser, after the page: what the drag preview,
 * the hover readout, the chart-click projection, the start and fill pickers and the state table's
 * transport columns call. Named here so that the browser's bundle keeps only these (and what they
 * use) and leaves out what only the server runs (whole paths, background lines) and IAPWS-IF97,
 * which a water sheet by IF97 loads beside it (browser-if97.ts).
 */
export {
	ThermoError,
	computeLeg,
	fixState,
	saturationAtP,
	saturationAtT,
	stateExtras,
	transport
} from './index.ts';
