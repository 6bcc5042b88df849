import type { Process } from '$lib/thermo/types';

/**
 * Statewright's process encoding: every process kind has its own colour from the Okabe–Ito
 * palette (tailwind tokens `leg.1…6`) AND its own stroke pattern, so a leg reads in colour, in
 * grey-scale print and for colour-blind readers alike. Our mapping:
 *
 * | process      | token | colour          | pattern       |
 * | ------------ | ----- | --------------- | ------------- |
 * | isobaric     | leg.1 | blue            | unbroken      |
 * | isochoric    | leg.2 | vermillion      | long dash     |
 * | isothermal   | leg.3 | bluish green    | dots          |
 * | isentropic   | leg.4 | reddish purple  | dash–dot      |
 * | isenthalpic  | leg.5 | orange          | short dash    |
 * | polytropic   | leg.6 | sky blue        | dash–dot–dot  |
 *
 * Token leg.7 (yellow) is not used for lines: it is too faint on the paper theme.
 * Patterns are in px for a 2.25 px stroke with round caps (dots are zero-length dashes).
 */
export interface ProcessStyle {
	process: Process;
	/** tailwind token name */
	token: `leg.${1 | 2 | 3 | 4 | 5 | 6}`;
	/** Okabe–Ito colour, as in tailwind.config.ts */
	colour: string;
	/** SVG stroke-dasharray, '' for unbroken */
	dash: string;
	/** name of the pattern, for the chart's text description */
	pattern: string;
	/** name of the colour, likewise */
	colourName: string;
	/** how the key and accessible names call the process */
	name: string;
}

export const PROCESS_STYLES: Readonly<Record<Process, ProcessStyle>> = Object.freeze({
	isobaric: {
		process: 'isobaric',
		token: 'leg.1',
		colour: '#0072B2',
		dash: '',
		pattern: 'unbroken',
		colourName: 'blue',
		name: 'isobaric'
	},
	isochoric: {
		process: 'isochoric',
		token: 'leg.2',
		colour: '#D55E00',
		dash: '13 5',
		pattern: 'long dash',
		colourName: 'vermillion',
		name: 'isochoric'
	},
	isothermal: {
		process: 'isothermal',
		token: 'leg.3',
		colour: '#009E73',
		dash: '0 4.5',
		pattern: 'dots',
		colourName: 'bluish green',
		name: 'isothermal'
	},
	isentropic: {
		process: 'isentropic',
		token: 'leg.4',
		colour: '#CC79A7',
		dash: '10 4 0 4',
		pattern: 'dash–dot',
		colourName: 'reddish purple',
		name: 'isentropic'
	},
	isenthalpic: {
		process: 'isenthalpic',
		token: 'leg.5',
		colour: '#E69F00',
		dash: '5 4',
		pattern: 'short dash',
		colourName: 'orange',
		name: 'isenthalpic (throttling)'
	},
	polytropic: {
		process: 'polytropic',
		token: 'leg.6',
		colour: '#56B4E9',
		dash: '10 4 0 4 0 4',
		pattern: 'dash–dot–dot',
		colourName: 'sky blue',
		name: 'polytropic'
	}
});

/** Processes in key order. */
export const PROCESS_ORDER: readonly Process[] = [
	'isobaric',
	'isochoric',
	'isothermal',
	'isentropic',
	'isenthalpic',
	'polytropic'
];

export function processStyle(process: Process): ProcessStyle {
	return PROCESS_STYLES[process];
}

/** Design limits: caution colour, heavier and longer-dashed than any leg, always labelled. */
export const LIMIT_STROKE = { width: 2.5, dash: '18 5' } as const;

/** Leg strokes. */
export const LEG_STROKE = { width: 2.25, casing: 6 } as const;

/** Stroke-pattern signature for comparing patterns: dash and gap lengths over one period. */
export function dashSignature(dash: string): number[] {
	if (dash.trim() === '') return [];
	const parts = dash
		.trim()
		.split(/[\s,]+/)
		.map(Number);
	return parts.length % 2 === 1 ? [...parts, ...parts] : parts;
}
