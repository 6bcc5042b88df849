import { describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import ProcessChart from './ProcessChart.svelte';
import { unitPrefs } from '$lib/units';
import { chartState } from '$lib/charts/test-fixtures';

describe('ProcessChart (server render)', () => {
	it('renders an image with a summary, a description and a group of marks', () => {
		const { body } = render(ProcessChart, {
			props: {
				kind: 'T-v',
				units: unitPrefs(),
				fluidName: 'water',
				states: [{ id: 'a', label: 'S1', state: chartState(453.15, 1e6, 0.1944) }],
				legs: []
			}
		});
		expect(body).toMatch(
			/<svg[^>]*role="img"[^>]*aria-label="Temperature–specific volume diagram of water, with the vapor dome and 1 state and 0 legs\."/
		);
		expect(body).toMatch(
			/<desc id="pc-[^"]+-desc">[^<]*State S1, superheated vapor, 180\.0.°C, 1000.kPa a/
		);
		expect(body).toMatch(/role="group"/);
		expect(body).toContain('Scroll or pinch to zoom');
	});
});
