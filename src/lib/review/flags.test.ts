import { describe, expect, it } from 'vitest';
import { flagText, noteFlags } from './flags';
import { midpointByLength } from '$lib/charts/chart';
import type { NoteView } from './types';

function note(id: string, anchor: NoteView['anchor'], extra: Partial<NoteView> = {}): NoteView {
	return {
		id,
		anchor,
		writtenAt: 'L1',
		label: anchor.kind === 'leg' ? 'L1' : 'S2',
		outdated: false,
		revision: null,
		body: 'x',
		author: { id: null, name: 'A' },
		at: 0,
		mentions: [],
		resolved: null,
		replies: [],
		lastActivityAt: 0,
		...extra
	};
}

describe('note flags on the charts', () => {
	it('one flag a leg or state with open threads, counting them; resolved, outdated and sheet notes have none', () => {
		const flags = noteFlags([
			note('a', { kind: 'leg', legId: 'heat' }),
			note('b', { kind: 'leg', legId: 'heat' }),
			note('c', { kind: 'state', at: 'heat' }),
			note('d', { kind: 'leg', legId: 'vent' }, { resolved: { by: 'P', at: 1 } }),
			note('e', { kind: 'leg', legId: 'gone' }, { outdated: true }),
			note('f', { kind: 'sheet' })
		]);
		expect(flags).toEqual([
			{
				key: 'leg:heat',
				target: { kind: 'leg', id: 'heat' },
				count: 2,
				label: 'L1',
				ids: ['a', 'b']
			},
			{
				key: 'state:heat',
				target: { kind: 'state', id: 'heat' },
				count: 1,
				label: 'S2',
				ids: ['c']
			}
		]);
		expect(flagText(flags[0])).toBe('2 open review notes on L1');
		expect(flagText(flags[1])).toBe('1 open review note on S2');
	});

	it('a leg’s flag goes halfway along it by length, not at its middle point', () => {
		// 30 px right, then 10 px up: halfway (20 px along) is 20 px right of the start
		const pts = [
			{ x: 0, y: 0 },
			{ x: 10, y: 0 },
			{ x: 30, y: 0 },
			{ x: 30, y: -10 }
		];
		expect(midpointByLength(pts)).toEqual({ x: 20, y: 0 });
		expect(midpointByLength([{ x: 5, y: 6 }])).toEqual({ x: 5, y: 6 });
		expect(midpointByLength([{ x: NaN, y: 1 }])).toBeNull();
	});
});
