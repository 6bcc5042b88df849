import { describe, expect, it } from 'vitest';
import { stackOffsets } from './stack';

describe('stackOffsets', () => {
	it('sets a closed cycle’s last state beside its first, leaving the others alone', () => {
		const pts = [
			{ id: 'start', x: 100, y: 200 },
			{ id: 'L1', x: 180, y: 120 },
			{ id: 'L2', x: 260, y: 120 },
			{ id: 'L3', x: 100.4, y: 199.7 }
		];
		const o = stackOffsets(pts, 9.5);
		expect(o.get('start')).toEqual({ x: 0, y: 0 });
		expect(o.get('L1')).toEqual({ x: 0, y: 0 });
		const last = o.get('L3')!;
		expect(last.beside).toBe('start');
		// drawn one disc width (plus the gap) to the right of the first state, at its height
		expect(100.4 + last.x).toBeCloseTo(100 + 2 * 9.5 + 2, 9);
		expect(199.7 + last.y).toBeCloseTo(200, 9);
	});

	it('stacks three coincident states in a row and keeps states apart by more than a radius where they were', () => {
		const o = stackOffsets(
			[
				{ id: 'a', x: 10, y: 10 },
				{ id: 'b', x: 10, y: 10 },
				{ id: 'c', x: 10, y: 10 },
				{ id: 'd', x: 30, y: 10 }
			],
			9.5
		);
		expect([o.get('a')!.x, o.get('b')!.x, o.get('c')!.x]).toEqual([0, 21, 42]);
		expect(o.get('c')!.beside).toBe('a');
		expect(o.get('d')).toEqual({ x: 0, y: 0 });
	});
});
