/**
 * Measured traces: logger CSV files read, checked line by line and fixed with the engine.
 * The file convention is in README.md beside this file. Pure TypeScript: runs on the server
 * (uploads are read and stored there) and in tests.
 */
export * from './types';
export {
	parseTraceCsv,
	decodeTraceFile,
	MAX_TRACE_BYTES,
	MAX_TRACE_ROWS,
	MAX_LISTED_REJECTIONS,
	TIME_UNITS,
	EXAMPLE_HEADER
} from './csv';
export { fixTracePoints, DEFAULT_SATURATION_TOLERANCE, MAX_SATURATION_TOLERANCE } from './fix';
export { readTraceCsv, type ReadTraceOptions } from './read';
export { chartTrace } from './chart';
