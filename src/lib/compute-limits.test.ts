import { describe, expect, it } from 'vitest';
import { SAMPLES_DEFAULT, SAMPLES_MIN } from './thermo';
import { MAX_SHEET_LEGS } from './sheets/doc';
import {
	API_PATH_POINTS_MAX,
	DEFAULT_LEG_POINTS,
	fitPathPoints,
	MIN_LEG_POINTS,
	pathPoints
} from './compute-limits';
import { pathRequestSchema } from './server/compute/schemas';

const leg = (samples?: number) => ({
	process: 'isobaric',
	target: { T: 400 },
	...(samples ? { samples } : {})
});

describe('compute work caps shared with the browser', () => {
	it('agree with the engine on default and least points per leg', () => {
		expect(DEFAULT_LEG_POINTS).toBe(SAMPLES_DEFAULT);
		expect(MIN_LEG_POINTS).toBe(SAMPLES_MIN);
	});

	it('count each leg’s samples, else the path’s, else 40', () => {
		expect(pathPoints({ legs: [leg(), leg()] })).toBe(80);
		expect(pathPoints({ samples: 100, legs: [leg(), leg(300)] })).toBe(400);
	});

	it('the largest sheet at its default sampling fits the path cap', () => {
		expect(MAX_SHEET_LEGS * DEFAULT_LEG_POINTS).toBeLessThanOrEqual(API_PATH_POINTS_MAX);
	});

	it('thin a sheet that asks for more than the cap to one sample count that fits, and leave the rest alone', () => {
		const heavy = {
			fluid: 'water',
			system: { kind: 'closed', mass: 1 },
			start: { T: 400, P: 1e5 },
			samples: 200,
			legs: Array.from({ length: 50 }, (_, i) => leg(i === 0 ? 1000 : undefined))
		};
		expect(pathRequestSchema.safeParse(heavy).success).toBe(false);
		const fitted = fitPathPoints(heavy);
		expect(fitted.samples).toBe(80);
		expect(fitted.legs.every((l) => l.samples === undefined)).toBe(true);
		expect(pathPoints(fitted)).toBeLessThanOrEqual(API_PATH_POINTS_MAX);
		expect(pathRequestSchema.safeParse(JSON.parse(JSON.stringify(fitted))).success).toBe(true);
		const light = { ...heavy, samples: undefined, legs: heavy.legs.slice(1) };
		expect(fitPathPoints(light)).toBe(light);
	});
});
