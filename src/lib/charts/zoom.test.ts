import { describe, expect, it } from 'vitest';
import { scaleLog, zoomIdentity } from 'd3';
import { plotTransform } from './chart';

describe('wheel zoom keeps the point under the pointer (plotTransform)', () => {
	it('for a plot offset from the overlay’s corner, as the chart’s margins make it', () => {
		const plot = { x: 66, y: 40, width: 400, height: 300 };
		const x0 = scaleLog().domain([1e-3, 10]).range([0, plot.width]);
		const pointer = 266; // overlay px
		const v = x0.invert(pointer - plot.x);
		for (const k of [1.25, 2, 0.6, 8]) {
			// what d3-zoom does for a wheel notch at the pointer: scale about it, in overlay px
			const t = zoomIdentity.translate(pointer * (1 - k), 0).scale(k);
			const x = plotTransform(t, plot).rescaleX(x0);
			expect(plot.x + x(v)).toBeCloseTo(pointer, 9);
			// without the shift the point drifts by (k − 1)·plot.x
			expect(Math.abs(plot.x + t.rescaleX(x0)(v) - pointer)).toBeCloseTo(
				Math.abs(k - 1) * plot.x,
				6
			);
		}
	});
});
