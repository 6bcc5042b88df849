import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO, signInPage, TEAM } from './helpers';

/*
 * The charts as drawn in Chromium: on every demo sheet (sheet page and print view) no label box
 * overlaps a drawn line, the path, a mark or another label, and no text is cut off by the plot or
 * the drawing's edge; wheel-zoom keeps the state under the pointer and the readout follows it.
 */

interface Box {
	x: number;
	y: number;
	width: number;
	height: number;
}
interface Seg {
	a: { x: number; y: number };
	b: { x: number; y: number };
}
interface Geometry {
	plot: Box;
	viewport: Box;
	segs: { cls: string; seg: Seg }[];
	marks: { cls: string; box: Box }[];
	labels: { cls: string; text: string; box: Box }[];
	texts: { cls: string; text: string; box: Box }[];
	/** where the isolines are cut away (under design-limit and c.p. labels) */
	holes: Box[];
}

/** Reads one drawing: its plot frame, every line as segments, marks, label boxes and all text boxes. */
async function geometry(drawing: Locator): Promise<Geometry> {
	return drawing.evaluate((svg) => {
		const num = (e: Element, a: string) => Number(e.getAttribute(a));
		const frame = svg.querySelector('rect.swc-frame')!;
		const plot = {
			x: num(frame, 'x'),
			y: num(frame, 'y'),
			width: num(frame, 'width'),
			height: num(frame, 'height')
		};
		const vb = (svg as SVGSVGElement).viewBox.baseVal;
		const segs: {
			cls: string;
			seg: { a: { x: number; y: number }; b: { x: number; y: number } };
		}[] = [];
		for (const p of svg.querySelectorAll(
			'path.swc-isoline, path.swc-dome-line, path.swc-limit, path.swc-leg-line, path.swc-leg-casing, path.swc-trace-line'
		)) {
			const d = p.getAttribute('d') ?? '';
			const pts = [...d.matchAll(/([ML])(-?[\d.]+),(-?[\d.]+)/g)].map((m) => ({
				move: m[1] === 'M',
				x: Number(m[2]),
				y: Number(m[3])
			}));
			for (let i = 1; i < pts.length; i++)
				if (!pts[i].move)
					segs.push({ cls: p.getAttribute('class')!, seg: { a: pts[i - 1], b: pts[i] } });
		}
		const tl = svg.querySelector('line.swc-triple');
		if (tl && (tl as SVGElement).style.display !== 'none')
			segs.push({
				cls: 'swc-triple',
				seg: {
					a: { x: num(tl, 'x1'), y: num(tl, 'y1') },
					b: { x: num(tl, 'x2'), y: num(tl, 'y2') }
				}
			});
		const marks: { cls: string; box: { x: number; y: number; width: number; height: number } }[] =
			[];
		for (const g of svg.querySelectorAll('g.swc-state, path.swc-crossing:not(.sample)')) {
			const m = (g.getAttribute('transform') ?? '').match(/translate\((-?[\d.]+),(-?[\d.]+)\)/);
			if (!m) continue;
			const r = g.classList.contains('swc-state') ? 9.5 : 4.5;
			marks.push({
				cls: g.getAttribute('class')!,
				box: { x: Number(m[1]) - r, y: Number(m[2]) - r, width: 2 * r, height: 2 * r }
			});
		}
		const cp = svg.querySelector('circle.swc-cp');
		if (cp && (cp as SVGElement).style.display !== 'none')
			marks.push({
				cls: 'swc-cp',
				box: { x: num(cp, 'cx') - 3.5, y: num(cp, 'cy') - 3.5, width: 7, height: 7 }
			});
		const bbox = (t: SVGGraphicsElement) => {
			const b = t.getBBox();
			const m = t.getCTM()!;
			const root = (svg as SVGSVGElement).getCTM()!.inverse().multiply(m);
			const p = new DOMPoint(b.x, b.y).matrixTransform(root);
			const q = new DOMPoint(b.x + b.width, b.y + b.height).matrixTransform(root);
			return {
				x: Math.min(p.x, q.x),
				y: Math.min(p.y, q.y),
				width: Math.abs(q.x - p.x),
				height: Math.abs(q.y - p.y)
			};
		};
		const visible = (t: Element) =>
			t.getAttribute('visibility') !== 'hidden' && (t.textContent ?? '').trim() !== '';
		const labels = [
			...svg.querySelectorAll('text.swc-iso-label, text.swc-limit-label, text.swc-cp-label')
		]
			.filter(visible)
			.map((t) => ({
				cls: t.getAttribute('class')!,
				text: t.textContent ?? '',
				box: bbox(t as SVGGraphicsElement)
			}));
		const texts = [...svg.querySelectorAll('text')].filter(visible).map((t) => ({
			cls: t.getAttribute('class') ?? '',
			text: t.textContent ?? '',
			box: bbox(t as SVGGraphicsElement)
		}));
		const holes = [...svg.querySelectorAll('mask rect.swc-mask-hole')].map((r) => ({
			x: num(r, 'x'),
			y: num(r, 'y'),
			width: num(r, 'width'),
			height: num(r, 'height')
		}));
		return {
			plot,
			viewport: { x: vb.x, y: vb.y, width: vb.width, height: vb.height },
			segs,
			marks,
			labels,
			texts,
			holes
		};
	});
}

function segHitsBox(s: Seg, r: Box): boolean {
	// Liang–Barsky: does the segment enter the (open) rectangle?
	const dx = s.b.x - s.a.x;
	const dy = s.b.y - s.a.y;
	let t0 = 0;
	let t1 = 1;
	const edges: [number, number][] = [
		[-dx, s.a.x - r.x],
		[dx, r.x + r.width - s.a.x],
		[-dy, s.a.y - r.y],
		[dy, r.y + r.height - s.a.y]
	];
	for (const [p, q] of edges) {
		if (p === 0) {
			if (q <= 0) return false;
		} else {
			const t = q / p;
			if (p < 0) t0 = Math.max(t0, t);
			else t1 = Math.min(t1, t);
			if (t0 >= t1) return false;
		}
	}
	return true;
}
const overlap = (a: Box, b: Box) =>
	a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
/** the glyph box less half a pixel all round (anti-aliasing) */
const shrink = (r: Box, by = 0.5): Box => ({
	x: r.x + by,
	y: r.y + by,
	width: r.width - 2 * by,
	height: r.height - 2 * by
});

function problems(g: Geometry): string[] {
	const out: string[] = [];
	const inPlot = (b: Box) =>
		b.x >= g.plot.x - 0.5 &&
		b.y >= g.plot.y - 0.5 &&
		b.x + b.width <= g.plot.x + g.plot.width + 0.5 &&
		b.y + b.height <= g.plot.y + g.plot.height + 0.5;
	for (const l of g.labels) {
		const b = shrink(l.box);
		if (!inPlot(l.box)) out.push(`"${l.text}" sticks out of the plot`);
		// an isoline under a limit or c.p. label is cut there (a hole in its mask): no line is drawn over the label
		const inHole = g.holes.some(
			(h) =>
				h.x <= b.x &&
				h.y <= b.y &&
				h.x + h.width >= b.x + b.width &&
				h.y + h.height >= b.y + b.height
		);
		if (l.cls === 'swc-iso-label' && inHole)
			out.push(`"${l.text}" is an isoline label in a mask hole`);
		for (const s of g.segs)
			if (segHitsBox(s.seg, b) && !(s.cls === 'swc-isoline' && inHole))
				out.push(`"${l.text}" is crossed by ${s.cls}`);
		for (const m of g.marks) if (overlap(b, m.box)) out.push(`"${l.text}" covers ${m.cls}`);
		for (const k of g.labels)
			if (k !== l && overlap(b, shrink(k.box))) out.push(`"${l.text}" overlaps "${k.text}"`);
	}
	for (const t of g.texts) {
		const v = g.viewport;
		const b = t.box;
		if (
			b.x < v.x - 0.5 ||
			b.y < v.y - 0.5 ||
			b.x + b.width > v.x + v.width + 0.5 ||
			b.y + b.height > v.y + v.height + 0.5
		)
			out.push(`"${t.text}" (${t.cls}) is cut off at the drawing's edge`);
	}
	return [...new Set(out)];
}

async function demoSheets(page: Page): Promise<{ id: string; title: string }[]> {
	const res = await page.request.get(`/api/v1/teams/${TEAM}/sheets`);
	expect(res.status()).toBe(200);
	const { sheets } = (await res.json()) as { sheets: { id: string; title: string }[] };
	expect(sheets.length).toBeGreaterThanOrEqual(4);
	return sheets;
}

async function checkDrawings(page: Page, where: string) {
	const drawings = page.locator('svg.swc-drawing');
	await expect(drawings.first()).toBeVisible();
	await expect(page.locator('text.swc-iso-label').first()).toBeAttached();
	await page.evaluate(() => document.fonts.ready);
	const n = await drawings.count();
	let labels = 0;
	for (let i = 0; i < n; i++) {
		const g = await geometry(drawings.nth(i));
		labels += g.labels.length;
		expect(problems(g), `${where}, chart ${i + 1}`).toEqual([]);
	}
	expect(labels, `${where}: labels are drawn`).toBeGreaterThan(n);
}

test.describe('chart labels', () => {
	test('on every demo sheet and its print view, no label touches a line, a mark or another label, and none is cut off', async ({
		page
	}) => {
		await signInPage(page, DEMO.viewer);
		for (const s of await demoSheets(page)) {
			await page.goto(`/t/${TEAM}/sheets/${s.id}`);
			await checkDrawings(page, `${s.title} (sheet)`);
			await page.goto(`/t/${TEAM}/sheets/${s.id}/print`);
			await checkDrawings(page, `${s.title} (print)`);
		}
	});

	test('at a phone’s width the labels keep clear too', async ({ page }) => {
		await page.setViewportSize({ width: 390, height: 844 });
		await signInPage(page, DEMO.checker);
		const [s] = await demoSheets(page);
		await page.goto(`/t/${TEAM}/sheets/${s.id}`);
		await checkDrawings(page, `${s.title} (390 px)`);
	});
});

test.describe('zoom', () => {
	test('wheel-zoom keeps the state under the pointer, and the readout follows the zoom', async ({
		page
	}) => {
		await signInPage(page, DEMO.viewer);
		const [s] = await demoSheets(page);
		await page.goto(`/t/${TEAM}/sheets/${s.id}`);
		const chart = page.locator('[data-chart="T-v"]');
		const overlay = chart.locator('svg.swc-overlay');
		await expect(chart.locator('circle.swc-hit-state').nth(1)).toBeAttached();
		const disc = async (i: number) => {
			const box = (await overlay.boundingBox())!;
			const c = chart.locator('circle.swc-hit-state').nth(i);
			return {
				x: box.x + Number(await c.getAttribute('cx')),
				y: box.y + Number(await c.getAttribute('cy'))
			};
		};
		const before = await disc(1);
		await page.mouse.move(before.x, before.y);
		const readout = chart.locator('.readout');
		await expect(readout).toContainText('T ');
		const rev = Number(await overlay.getAttribute('data-path-rev'));
		for (let i = 0; i < 3; i++) await page.mouse.wheel(0, -120);
		await expect
			.poll(async () => Number(await overlay.getAttribute('data-path-rev')))
			.toBeGreaterThan(rev + 2);
		const after = await disc(1);
		expect(Math.abs(after.x - before.x), 'x drift, px').toBeLessThan(2);
		expect(Math.abs(after.y - before.y), 'y drift, px').toBeLessThan(2);
		// the view did zoom: another state moved
		const plotBox = (await overlay.boundingBox())!;
		expect(plotBox.width).toBeGreaterThan(100);

		// a wheel notch elsewhere, with no pointer move before it: the readout shows what lies under that point now
		const coordsOf = async () => (await readout.innerText()).split(' · ').slice(0, 2).join(' · ');
		const shown = await coordsOf();
		const at = { x: Math.round(before.x - 60), y: Math.round(before.y + 40) }; // whole px, as a real pointer reports them
		await overlay.evaluate(
			(el, p) =>
				el.dispatchEvent(
					new WheelEvent('wheel', {
						deltaY: -100,
						deltaMode: 0,
						clientX: p.x,
						clientY: p.y,
						bubbles: true,
						cancelable: true
					})
				),
			at
		);
		await expect.poll(coordsOf).not.toBe(shown);
		const afterWheel = await coordsOf();
		await page.mouse.move(at.x, at.y);
		await expect.poll(coordsOf).toBe(afterWheel);
	});
});
