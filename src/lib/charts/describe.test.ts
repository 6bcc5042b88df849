import { describe, expect, it } from 'vitest';
import { unitPrefs } from '$lib/units';
import {
	chartDescription,
	chartSummary,
	legAriaLabel,
	limitText,
	stateAriaLabel
} from './describe';
import { chartState } from './test-fixtures';
import type { ChartLeg, ChartState } from './types';

const si = unitPrefs();
const states: ChartState[] = [
	{ id: 'a', label: 'S1', state: chartState(393.15, 198_670, 0.2683, 'saturated-mixture', 0.3) },
	{ id: 'b', label: 'S2', state: chartState(453.15, 1e6, 0.1944, 'superheated-vapor') }
];
const legs: ChartLeg[] = [
	{
		id: 'l1',
		process: 'isochoric',
		points: states.map((s) => s.state),
		crossings: [
			{ line: 'saturated-vapor', state: chartState(420, 4e5, 0.2683, 'saturated-vapor', 1) }
		],
		from: 'a',
		to: 'b'
	}
];

describe('accessible names', () => {
	it('a state says its label, phase, temperature and pressure in display units', () => {
		expect(stateAriaLabel(states[1], si)).toBe(
			'State S2, superheated vapor, 180.0\u00a0°C, 1000\u00a0kPa a'
		);
		expect(
			stateAriaLabel(states[1], unitPrefs({ pressureUnit: 'MPa', pressureReference: 'gauge' }))
		).toBe('State S2, superheated vapor, 180.0\u00a0°C, 0.8987\u00a0MPa g');
		expect(stateAriaLabel(states[0], si)).toMatch(
			/saturated mixture, 120\.0\u00a0°C, 198\.7\u00a0kPa a, quality 0\.300$/
		);
	});

	it('a leg says its ends, process and crossings', () => {
		expect(legAriaLabel(legs[0], states)).toBe(
			'Leg S1 to S2, isochoric, crosses the saturated-vapor line'
		);
		expect(legAriaLabel({ ...legs[0], process: 'polytropic', n: 1.3, crossings: [] }, states)).toBe(
			'Leg S1 to S2, polytropic with n = 1.3'
		);
	});

	it('limits read with name and value', () => {
		expect(limitText('designPressure', 1.1e6, si)).toBe('design pressure 1100\u00a0kPa a');
		expect(limitText('minimumTemperature', 253.15, si)).toBe('minimum temperature −20.0\u00a0°C');
	});

	it('the chart summary and description', () => {
		expect(chartSummary({ kind: 'T-v', fluidName: 'water', states, legs, prefs: si })).toBe(
			'Temperature–specific volume diagram of water, with the vapor dome and 2 states and 1 leg.'
		);
		const d = chartDescription({
			kind: 'P-v',
			states,
			legs,
			prefs: si,
			limits: { designPressure: { value: 1.1e6 } }
		});
		expect(d).toContain('State S1');
		expect(d).toContain('Leg S1 to S2');
		expect(d).toContain('Design limit: design pressure');
		expect(d).toContain('Legs are drawn by process: isochoric as a vermillion long dash line.');
		expect(d).not.toContain('Vapor dome by');
		const note = 'Vapor dome by IAPWS-IF97 up to 643.15 K.';
		expect(chartDescription({ kind: 'T-v', states, legs, prefs: si, domeNote: note })).toContain(
			note
		);
	});

	it('the description names the measured traces, overlaid revisions and open-note flags drawn', () => {
		const d = chartDescription({
			kind: 'P-h',
			states,
			legs,
			prefs: si,
			traces: [
				{
					id: 't1',
					label: 'jacket logger 1',
					points: [
						{ T: 400, P: 2e5 },
						{ T: 410, P: 2e5 }
					]
				},
				{ id: 'r1', label: 'Rev 1', kind: 'revision', points: [{ T: 400, P: 2e5 }] },
				{ id: 't2', label: 'empty', points: [] }
			],
			flags: [
				{ key: 'leg:l1', target: { kind: 'leg', id: 'l1' }, count: 2, label: 'L1' },
				{ key: 'state:b', target: { kind: 'state', id: 'b' }, count: 1, label: 'S2' }
			]
		});
		expect(d).toContain('Measured trace jacket logger 1: 2 points.');
		expect(d).toContain('Overlaid for comparison: Rev 1, 1 point.');
		expect(d).not.toContain('empty');
		expect(d).toContain('Open review notes flagged: 2 on L1, 1 on S2.');
		expect(chartDescription({ kind: 'P-h', states, legs, prefs: si })).not.toContain('review');
	});
});
