import { describe, expect, it } from 'vitest';
// eslint-disable-next-line no-restricted-imports -- checks the chart's colours against the site's Tailwind theme
import config from '../../../tailwind.config';
import { dashSignature, LIMIT_STROKE, PROCESS_ORDER, PROCESS_STYLES } from './encoding';
import { keyEntries, layoutKey } from './key';
import { chartState } from './test-fixtures';
import type { ChartLeg } from './types';

const styles = Object.values(PROCESS_STYLES);
// Okabe & Ito (2008), "Color Universal Design": the eight-colour palette (from memory)
const OKABE_ITO = [
	'#000000',
	'#E69F00',
	'#56B4E9',
	'#009E73',
	'#F0E442',
	'#0072B2',
	'#D55E00',
	'#CC79A7'
];

describe('process encoding', () => {
	it('covers every process kind', () => {
		expect(new Set(styles.map((s) => s.process))).toEqual(new Set(PROCESS_ORDER));
		expect(PROCESS_ORDER).toHaveLength(6);
	});

	it('every process has its own colour', () => {
		expect(new Set(styles.map((s) => s.colour.toLowerCase())).size).toBe(styles.length);
	});

	it('every process has its own stroke pattern (so grey-scale print still reads)', () => {
		const sigs = styles.map((s) => JSON.stringify(dashSignature(s.dash)));
		expect(new Set(sigs).size).toBe(styles.length);
		expect(new Set(styles.map((s) => s.pattern)).size).toBe(styles.length);
		expect(new Set(styles.map((s) => s.colourName)).size).toBe(styles.length);
		expect(styles.filter((s) => s.dash === '')).toHaveLength(1);
	});

	it('colours are the tailwind leg tokens, from the Okabe–Ito palette', () => {
		const legs = (config.theme.extend.colors as { leg: Record<string, string> }).leg;
		for (const s of styles) {
			expect(legs[s.token.slice(4)]).toBe(s.colour);
			expect(OKABE_ITO).toContain(s.colour);
		}
	});

	it('the design-limit pattern is none of the leg patterns', () => {
		const limit = JSON.stringify(dashSignature(LIMIT_STROKE.dash));
		expect(styles.map((s) => JSON.stringify(dashSignature(s.dash)))).not.toContain(limit);
	});
});

const leg = (id: string, process: ChartLeg['process'], crossing = false): ChartLeg => ({
	id,
	process,
	points: [chartState(300, 1e5, 1), chartState(400, 1e5, 2)],
	crossings: crossing
		? [{ line: 'saturated-vapor', state: chartState(372.8, 1e5, 1.69, 'saturated-vapor', 1) }]
		: [],
	from: 'a',
	to: 'b'
});

describe('key', () => {
	it('lists the processes used, in a fixed order, then the marks present', () => {
		const entries = keyEntries(
			[leg('1', 'isenthalpic'), leg('2', 'isobaric', true), leg('3', 'isobaric')],
			{ limits: true, traces: false }
		);
		expect(entries.map((e) => e.text)).toEqual([
			'isobaric',
			'isenthalpic (throttling)',
			'saturation crossing',
			'design limit'
		]);
	});

	it('keys open-note flags when the chart carries any, after the marks', () => {
		const entries = keyEntries([leg('1', 'isobaric')], { limits: true, traces: true, flags: true });
		expect(entries.map((e) => e.kind)).toEqual(['process', 'limit', 'trace', 'note-flag']);
		expect(entries.at(-1)!.text).toBe('open review notes (count)');
		expect(
			keyEntries([leg('1', 'isobaric')], { limits: false, traces: false }).map((e) => e.kind)
		).toEqual(['process']);
	});

	it('wraps onto more rows when narrow', () => {
		const entries = keyEntries(
			PROCESS_ORDER.map((p, i) => leg(String(i), p)),
			{ limits: true, traces: true }
		);
		expect(layoutKey(entries, 2000).rows).toBe(1);
		const narrow = layoutKey(entries, 300);
		expect(narrow.rows).toBeGreaterThan(2);
		for (const s of narrow.slots) expect(s.x).toBeLessThan(300);
		expect(layoutKey([], 300).rows).toBe(0);
	});
});
