import {
	drag,
	pointer,
	select,
	zoom,
	zoomIdentity,
	type ZoomBehavior,
	type ZoomTransform
} from 'd3';
import type { UnitPrefs } from '$lib/units';
import { clampCoords } from './clamp';
import { isPressureLimit, legAriaLabel, LIMIT_ORDER, limitText, stateAriaLabel } from './describe';
import { LEG_STROKE, LIMIT_STROKE, processStyle } from './encoding';
import { KEY, keyEntries, layoutKey } from './key';
import { stackOffsets } from './stack';
import {
	levelAnchors,
	placeChartLabels,
	textWidth,
	type LabelPlacement,
	type LabelRequest
} from './labels';
import {
	axisTicks,
	axisUnit,
	compactNumber,
	fitDomain,
	makeXScale,
	makeYScale,
	thinLabels,
	xScaleType,
	yScaleType,
	type Scale,
	type Tick
} from './scales';
import { DRAWING_CSS, OVERLAY_CSS } from './style';
import { VIEWS, type ChartView, type ViewProp } from './views';
import type {
	ChartCoords,
	ChartKind,
	ChartLeg,
	ChartSelection,
	ChartState,
	CurvePoint,
	DesignLimitName,
	DesignLimits,
	Domain,
	FluidRange,
	Isoline,
	MeasuredTrace,
	NoteFlag,
	Point,
	PressureScale,
	Rect,
	SaturationCurve,
	TriplePoint
} from './types';

/** Everything that changes rarely: redrawing it redraws the whole chart. */
export interface ChartFrame {
	kind: ChartKind;
	pressureScale: PressureScale;
	width: number;
	height: number;
	units: UnitPrefs;
	saturation?: SaturationCurve | null;
	triple?: TriplePoint | null;
	range?: FluidRange | null;
	isolines?: readonly Isoline[] | null;
	limits?: DesignLimits | null;
	/** a fixed window instead of the fitted one */
	domain?: Domain | null;
	fluidName?: string;
}

/**
 * Whether two frames draw the same: every field the same value (nested data by identity, as the
 * chart treats it as replaced, never mutated), the unit settings field by field (a caller copies
 * them to catch edits in place).
 */
export function sameFrame(a: ChartFrame, b: ChartFrame): boolean {
	const keys = new Set([...Object.keys(a), ...Object.keys(b)] as (keyof ChartFrame)[]);
	for (const k of keys) {
		if (k === 'units') continue;
		if (a[k] !== b[k]) return false;
	}
	const ua = a.units as unknown as Record<string, unknown>;
	const ub = b.units as unknown as Record<string, unknown>;
	const unitKeys = new Set([...Object.keys(ua), ...Object.keys(ub)]);
	for (const k of unitKeys) if (ua[k] !== ub[k]) return false;
	return true;
}

/** What changes while a designer drags: redrawing it touches only the path layers. */
export interface ChartPath {
	states: readonly ChartState[];
	legs: readonly ChartLeg[];
	selection: ChartSelection | null;
	traces?: readonly MeasuredTrace[] | null;
	/** a preview computed in the browser while dragging: the legs are drawn lighter until the real answer replaces it */
	preview?: boolean;
	/**
	 * a state is being dragged: the server's answers, like previews, leave the labels where they
	 * are (placing them is most of a redraw); they are placed again when the gesture ends
	 */
	moving?: boolean;
	/** open review notes: a numbered flag beside each leg or state that has them (in the drawing, so exports carry them) */
	flags?: readonly NoteFlag[] | null;
}

export interface ChartInteraction {
	mode: 'select' | 'add-leg';
	canDrag: (stateId: string) => boolean;
}

export interface StateDragEvent {
	stateId: string;
	/** pointer position in SI, clamped to the fluid's valid range */
	coords: ChartCoords;
	/** why the position was clamped, or null */
	reason: string | null;
}

export interface AddPointEvent {
	coords: ChartCoords;
	reason: string | null;
}

export interface NudgeEvent {
	target: ChartSelection;
	/** the state the nudge moves: the state itself, or a leg's end state */
	stateId: string;
	direction: 'left' | 'right' | 'up' | 'down';
	/** Alt = fine (1 px), plain = normal (4 px), Shift = coarse (20 px) */
	step: 'fine' | 'normal' | 'coarse';
	/** the moved state's position after the nudge, SI, clamped */
	coords: ChartCoords;
	reason: string | null;
}

export interface HoverEvent {
	coords: ChartCoords;
	/** set when the pointer is outside the fluid's valid range */
	reason: string | null;
}

export interface ChartHandlers {
	select(selection: ChartSelection | null): void;
	dragStart(e: StateDragEvent): void;
	drag(e: StateDragEvent): void;
	dragEnd(e: StateDragEvent): void;
	add(e: AddPointEvent): void;
	nudge(e: NudgeEvent): void;
	hover(e: HoverEvent | null): void;
}

export interface ChartController {
	setFrame(frame: ChartFrame): void;
	setPath(path: ChartPath): void;
	setInteraction(interaction: ChartInteraction): void;
	/** back to the fitted window (what double-click does) */
	resetView(): void;
	/** the plot rectangle in SVG px (for tests and benchmarks) */
	plotRect(): Rect;
	/** SI coordinates → SVG px */
	toScreen(c: ChartCoords): Point | null;
	destroy(): void;
}

const NUDGE_PX = { fine: 1, normal: 4, coarse: 20 } as const;
const STATE_R = 9.5;
const MARGIN = { right: 18, bottom: 46, left: 66 } as const;
let instances = 0;

function polylineD(points: readonly Point[]): string {
	let d = '';
	for (let i = 0; i < points.length; i++) {
		const p = points[i];
		if (!Number.isFinite(p.x) || !Number.isFinite(p.y)) continue;
		d += `${d === '' ? 'M' : 'L'}${p.x.toFixed(1)},${p.y.toFixed(1)}`;
	}
	return d;
}

/**
 * d3-zoom's transform is in the overlay's px (the pointer's), the scales map into the plot's own
 * px (0 at the plot's corner): shift it by (k − 1)·offset so that the point under the pointer stays
 * under it while zooming.
 */
export function plotTransform(t: ZoomTransform, plot: { x: number; y: number }): ZoomTransform {
	return zoomIdentity.translate(t.x + (t.k - 1) * plot.x, t.y + (t.k - 1) * plot.y).scale(t.k);
}

/** Anything with some of a view's properties (a State has them all; an isoline point may lack h and s). */
type Projectable = { [K in ViewProp]?: number | null };

/** Whether a point has both of the view's properties (and a positive v where v is one). */
function drawable(view: ChartView, p: Projectable): boolean {
	for (const k of view.pair) {
		const q = p[k];
		if (typeof q !== 'number' || !Number.isFinite(q) || (k === 'v' && !(q > 0))) return false;
	}
	return true;
}

/** The point halfway along a polyline, by length (null for fewer than one finite point). */
export function midpointByLength(points: readonly Point[]): Point | null {
	const pts = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
	if (pts.length === 0) return null;
	let total = 0;
	for (let i = 1; i < pts.length; i++)
		total += Math.hypot(pts[i].x - pts[i - 1].x, pts[i].y - pts[i - 1].y);
	let left = total / 2;
	for (let i = 1; i < pts.length; i++) {
		const d = Math.hypot(pts[i].x - pts[i - 1].x, pts[i].y - pts[i - 1].y);
		if (d >= left && d > 0) {
			const f = left / d;
			return {
				x: pts[i - 1].x + f * (pts[i].x - pts[i - 1].x),
				y: pts[i - 1].y + f * (pts[i].y - pts[i - 1].y)
			};
		}
		left -= d;
	}
	return pts[pts.length - 1];
}

function diamond(size: number): string {
	return `M0,${-size}L${size},0L0,${size}L${-size},0Z`;
}

/**
 * Draw a T–v or P–v chart into two stacked SVG elements: `drawing` (role="img", the picture
 * that is exported) and `overlay` (transparent, on top: focusable marks, zoom, drag, hover).
 * The frame (axes, dome, isolines, limits) is redrawn only by `setFrame` and zoom; `setPath`
 * updates the legs, states, crossings, traces, key and the labels that must avoid them, with
 * keyed joins.
 */
export function createChart(
	drawing: SVGSVGElement,
	overlay: SVGSVGElement,
	handlers: ChartHandlers
): ChartController {
	const uid = `swc${++instances}`;
	let frame: ChartFrame | null = null;
	let path: ChartPath = { states: [], legs: [], selection: null, traces: [] };
	let interaction: ChartInteraction = { mode: 'select', canDrag: () => true };
	let transform: ZoomTransform = zoomIdentity;
	let baseDomain: Domain | null = null;
	let domainKey: unknown[] = [];
	let fittedWithPath = false;
	let keyRows = 0;
	let x: Scale | null = null;
	let y: Scale | null = null;
	let plot: Rect = { x: 0, y: 0, width: 0, height: 0 };
	/** `off`: the disc's stacking offset when the drag began (kept, so the state does not jump as it leaves the stack) */
	let dragging: { id: string; moved: boolean; off: Point } | null = null;
	let pathRev = 0;
	/** the frame was drawn since the labels were last placed */
	let labelsStale = true;
	/** how many times the labels and the frame were drawn (on the overlay, for tests and benchmarks) */
	let labelsRev = 0;
	let frameRev = 0;
	/** discs moved beside an earlier state they would hide (a cycle's last state on its first) */
	let stateShift = new Map<string, Point & { beside?: string }>();
	const shifted = (d: ChartState): Point => {
		const p = project(d.state);
		const o = stateShift.get(d.id);
		return o ? { x: p.x + o.x, y: p.y + o.y } : p;
	};

	// ---- drawing skeleton
	const svg = select(drawing).classed('swc-drawing', true);
	svg.selectAll('*:not(title):not(desc)').remove();
	svg.append('style').text(DRAWING_CSS);
	const defs = svg.append('defs');
	const clipRect = defs.append('clipPath').attr('id', `${uid}-clip`).append('rect');
	// isolines are cut where a design-limit or c.p. label sits over them (see placeChartLabels)
	const isoMask = defs
		.append('mask')
		.attr('id', `${uid}-isomask`)
		.attr('maskUnits', 'userSpaceOnUse');
	const isoMaskAll = isoMask.append('rect').attr('fill', 'white');
	const plate = svg.append('rect').attr('class', 'swc-plate');
	const root = svg.append('g');
	const gGrid = root.append('g').attr('class', 'swc-grid');
	const clipped = root.append('g').attr('clip-path', `url(#${uid}-clip)`);
	const domeFill = clipped.append('path').attr('class', 'swc-dome-fill');
	const gIso = clipped.append('g').attr('mask', `url(#${uid}-isomask)`);
	const domeLine = clipped.append('path').attr('class', 'swc-dome-line');
	const tripleLine = clipped.append('line').attr('class', 'swc-triple');
	const meltingLine = clipped.append('path').attr('class', 'swc-melting');
	const gLimits = clipped.append('g');
	const gLegs = clipped.append('g');
	const gTraces = clipped.append('g');
	const gCross = clipped.append('g');
	const cp = clipped.append('circle').attr('class', 'swc-cp').attr('r', 3.5);
	const gStates = clipped.append('g');
	const gFlags = clipped.append('g').attr('class', 'swc-note-flags');
	const gLabels = root.append('g');
	const cpLabel = gLabels.append('text').attr('class', 'swc-cp-label').text('c.p.');
	const frameRect = root.append('rect').attr('class', 'swc-frame');
	const gAxes = root.append('g');
	const gKey = root.append('g').attr('class', 'swc-key');

	// ---- overlay skeleton
	const ov = select(overlay).classed('swc-overlay', true);
	ov.selectAll('*').remove();
	ov.append('style').text(OVERLAY_CSS);
	const oroot = ov.append('g');
	const bg = oroot.append('rect').attr('class', 'swc-bg');
	const crossV = oroot.append('line').attr('class', 'swc-cross').style('display', 'none');
	const crossH = oroot.append('line').attr('class', 'swc-cross').style('display', 'none');
	const hitLegs = oroot.append('g');
	const hitStates = oroot.append('g');
	const ghost = oroot
		.append('circle')
		.attr('class', 'swc-ghost')
		.attr('r', STATE_R + 3)
		.style('display', 'none');

	// labels are placed with measured text boxes: place them again once the web fonts are in
	let destroyed = false;
	if (typeof document !== 'undefined' && document.fonts && document.fonts.status !== 'loaded')
		void document.fonts.ready.then(() => {
			measured.clear();
			if (!destroyed && frame) drawFrame();
		});

	const view = (): ChartView => VIEWS[frame!.kind];
	const project = (p: Projectable): Point => {
		const vw = view();
		return {
			x: plot.x + x!(p[vw.x.prop] ?? NaN),
			y: plot.y + y!(p[vw.y.prop] ?? NaN)
		};
	};
	const dataAt = (px: number, py: number): ChartCoords => {
		const vw = view();
		return { [vw.x.prop]: x!.invert(px - plot.x), [vw.y.prop]: y!.invert(py - plot.y) };
	};
	const clamp = (c: ChartCoords) =>
		clampCoords(
			frame!.kind,
			c,
			{ triple: frame!.triple, range: frame!.range, saturation: frame!.saturation },
			frame!.units
		);

	function margins() {
		return { top: 16 + Math.max(1, keyRows) * KEY.row, ...MARGIN };
	}

	function computeKeyRows(width: number): number {
		return layoutKey(currentKeyEntries(), width - MARGIN.left - MARGIN.right).rows;
	}

	function currentKeyEntries() {
		const vw = view();
		const drawn = (path.traces ?? []).filter((t) => t.points.some((p) => drawable(vw, p)));
		return keyEntries(path.legs, {
			limits: drawnLimits().length > 0,
			traces: drawn.some((t) => t.kind !== 'revision'),
			bands:
				vw.x.prop === 'v' &&
				(path.traces ?? []).some((t) => t.kind !== 'revision' && t.points.some((p) => p.vBand)),
			flags: (path.flags ?? []).length > 0,
			revisions: drawn.filter((t) => t.kind === 'revision').map((t) => t.label)
		});
	}

	/** Limits that can be drawn on this chart kind: straight rules, or curves when points are given. */
	function drawnLimits(): {
		name: DesignLimitName;
		value: number;
		points?: readonly CurvePoint[];
		straight: boolean;
	}[] {
		if (!frame?.limits) return [];
		const vw = view();
		const out = [];
		for (const name of LIMIT_ORDER) {
			const lim = frame.limits[name];
			if (!lim) continue;
			// a rule across the chart where the limit's quantity is the y axis, else its own curve
			const straight = vw.y.prop === (isPressureLimit(name) ? 'P' : 'T');
			const points = straight ? [] : (lim.points ?? []).filter((p) => drawable(vw, p));
			if (straight) out.push({ name, value: lim.value, straight });
			else if (points.length > 1) out.push({ name, value: lim.value, points, straight });
		}
		return out;
	}

	function ensureDomain() {
		const f = frame!;
		const key = [f.kind, f.pressureScale, f.saturation, f.domain, f.triple];
		const changed = key.length !== domainKey.length || key.some((k, i) => k !== domainKey[i]);
		if (changed || !baseDomain) {
			domainKey = key;
			baseDomain =
				f.domain ??
				fitDomain(f.kind, f.pressureScale, {
					saturation: f.saturation,
					triple: f.triple,
					states: path.states,
					legs: path.legs,
					limits: f.limits
				});
			fittedWithPath = path.states.length > 0;
			transform = zoomIdentity;
			ov.property('__zoom', zoomIdentity);
		}
	}

	function layout() {
		const f = frame!;
		keyRows = computeKeyRows(f.width);
		const m = margins();
		plot = {
			x: m.left,
			y: m.top,
			width: Math.max(10, f.width - m.left - m.right),
			height: Math.max(10, f.height - m.top - m.bottom)
		};
		const x0 = makeXScale(baseDomain!, plot.width, xScaleType(f.kind, f.pressureScale));
		const y0 = makeYScale(f.kind, f.pressureScale, baseDomain!, plot.height);
		const local = plotTransform(transform, plot);
		x = local.rescaleX(x0);
		y = local.rescaleY(y0);
	}

	// ---- frame drawing
	function drawFrame() {
		if (!frame || frame.width <= 0 || frame.height <= 0) return;
		ensureDomain();
		layout();
		const f = frame;
		svg
			.attr('width', f.width)
			.attr('height', f.height)
			.attr('viewBox', `0 0 ${f.width} ${f.height}`);
		ov.attr('width', f.width)
			.attr('height', f.height)
			.attr('viewBox', `0 0 ${f.width} ${f.height}`);
		plate.attr('width', f.width).attr('height', f.height);
		clipRect
			.attr('x', plot.x)
			.attr('y', plot.y)
			.attr('width', plot.width)
			.attr('height', plot.height);
		frameRect
			.attr('x', plot.x)
			.attr('y', plot.y)
			.attr('width', plot.width)
			.attr('height', plot.height);
		bg.attr('x', plot.x).attr('y', plot.y).attr('width', plot.width).attr('height', plot.height);
		drawAxes();
		drawDome();
		drawIsolines();
		drawLimits();
		labelsStale = true;
		ov.attr('data-frame-rev', ++frameRev);
		drawPath();
	}

	function drawAxes() {
		const f = frame!;
		const atm = f.units.atmosphere;
		const vw = view();
		const xType = xScaleType(f.kind, f.pressureScale);
		const yType = yScaleType(f.kind, f.pressureScale);
		const xDomain = x!.domain() as [number, number];
		const xUnit = axisUnit(vw.x.prop, f.units, xType, xDomain);
		const yAxis = vw.y.prop;
		const yDomain = y!.domain() as [number, number];
		const yUnit = axisUnit(yAxis, f.units, yType, yDomain);
		const xt = thinLabels(
			axisTicks(xType, xDomain, xUnit, atm, Math.max(3, Math.round(plot.width / 90))),
			(s) => x!(s),
			8,
			(l) => textWidth(l, 10)
		);
		const yt = thinLabels(
			axisTicks(yType, yDomain, yUnit, atm, Math.max(3, Math.round(plot.height / 60))),
			(s) => -y!(s),
			4,
			() => 11
		);
		const inX = (t: Tick) => x!(t.value) >= -0.5 && x!(t.value) <= plot.width + 0.5;
		const inY = (t: Tick) => y!(t.value) >= -0.5 && y!(t.value) <= plot.height + 0.5;
		const xs = xt.filter(inX);
		const ys = yt.filter(inY);

		gGrid
			.selectAll('line.gx')
			.data(xs.filter((t) => t.major))
			.join('line')
			.attr('class', 'gx')
			.attr('x1', (t) => plot.x + x!(t.value))
			.attr('x2', (t) => plot.x + x!(t.value))
			.attr('y1', plot.y)
			.attr('y2', plot.y + plot.height);
		gGrid
			.selectAll('line.gy')
			.data(ys.filter((t) => t.major))
			.join('line')
			.attr('class', 'gy')
			.attr('x1', plot.x)
			.attr('x2', plot.x + plot.width)
			.attr('y1', (t) => plot.y + y!(t.value))
			.attr('y2', (t) => plot.y + y!(t.value));

		// inward ticks on all four sides, like a drafting frame
		const tickPath = (t: Tick, axis: 'x' | 'y') => {
			const len = t.major ? 6 : 3;
			if (axis === 'x') {
				const px = (plot.x + x!(t.value)).toFixed(1);
				return `M${px},${plot.y + plot.height}v${-len}M${px},${plot.y}v${len}`;
			}
			const py = (plot.y + y!(t.value)).toFixed(1);
			return `M${plot.x},${py}h${len}M${plot.x + plot.width},${py}h${-len}`;
		};
		gAxes
			.selectAll('path.swc-tick')
			.data([xs.map((t) => tickPath(t, 'x')).join('') + ys.map((t) => tickPath(t, 'y')).join('')])
			.join('path')
			.attr('class', 'swc-tick')
			.attr('d', (d) => d);
		gAxes
			.selectAll('text.xl')
			.data(xs.filter((t) => t.label))
			.join('text')
			.attr('class', 'xl swc-num')
			.attr('x', (t) => plot.x + x!(t.value))
			.attr('y', plot.y + plot.height + 15)
			.attr('text-anchor', 'middle')
			.text((t) => t.label);
		gAxes
			.selectAll('text.yl')
			.data(ys.filter((t) => t.label))
			.join('text')
			.attr('class', 'yl swc-num')
			.attr('x', plot.x - 7)
			.attr('y', (t) => plot.y + y!(t.value))
			.attr('dy', '0.34em')
			.attr('text-anchor', 'end')
			.text((t) => t.label);

		const titles = [
			{
				cls: 'xt',
				sym: vw.x.prop,
				word: vw.x.word,
				unit: xType === 'log' ? `${xUnit.label}, log` : xUnit.label,
				x: plot.x + plot.width / 2,
				y: plot.y + plot.height + 36,
				rotate: false
			},
			{
				cls: 'yt',
				sym: yAxis,
				word: vw.y.word,
				unit: yType === 'log' ? `${yUnit.label}, log` : yUnit.label,
				x: 16,
				y: plot.y + plot.height / 2,
				rotate: true
			}
		];
		gAxes
			.selectAll('text.swc-title')
			.data(titles, (d) => (d as { cls: string }).cls)
			.join((enter) => {
				const t = enter.append('text').attr('text-anchor', 'middle');
				t.append('tspan').attr('class', 'w');
				t.append('tspan').attr('class', 'swc-sym');
				t.append('tspan').attr('class', 'swc-unit');
				return t;
			})
			.attr('class', (d) => `swc-title ${d.cls}`)
			.attr('transform', (d) =>
				d.rotate ? `translate(${d.x},${d.y}) rotate(-90)` : `translate(${d.x},${d.y})`
			)
			.each(function (d) {
				const t = select(this);
				t.select('tspan.w').text(`${d.word} `);
				t.select('tspan.swc-sym').text(d.sym);
				t.select('tspan.swc-unit').text(`  ·  ${d.unit}`);
			});
	}

	function drawDome() {
		const sat = frame!.saturation;
		// the fluid ends at the melting curve: drawn where it falls in view (clipped like the dome)
		const melt = sat?.melting ?? [];
		meltingLine.attr('d', melt.length > 1 ? polylineD(melt.map(project)) : null);
		if (!sat || sat.liquid.length < 2 || sat.vapor.length < 2) {
			domeFill.attr('d', null);
			domeLine.attr('d', null);
			cp.style('display', 'none');
			tripleLine.style('display', 'none');
			return;
		}
		const outline = [...sat.liquid, sat.critical, ...[...sat.vapor].reverse()].map(project);
		const d = polylineD(outline);
		domeFill.attr('d', d + 'Z');
		domeLine.attr('d', d);
		const c = project(sat.critical);
		cp.style('display', null).attr('cx', c.x).attr('cy', c.y);
		const a = project(sat.liquid[0]);
		const b = project(sat.vapor[0]);
		tripleLine
			.style('display', null)
			.attr('x1', a.x)
			.attr('y1', a.y)
			.attr('x2', b.x)
			.attr('y2', b.y);
	}

	function drawIsolines() {
		const iso = frame!.isolines ?? [];
		gIso
			.selectAll('path')
			.data(iso)
			.join('path')
			.attr('class', 'swc-isoline')
			.attr('d', (l) => polylineD(l.points.filter((p) => drawable(view(), p)).map(project)));
	}

	function drawLimits() {
		const lims = drawnLimits();
		gLimits
			.selectAll('path')
			.data(lims, (d) => (d as { name: string }).name)
			.join('path')
			.attr('class', 'swc-limit')
			.attr('stroke-width', LIMIT_STROKE.width)
			.attr('stroke-dasharray', LIMIT_STROKE.dash)
			.attr('d', (l) =>
				l.straight ? polylineD(limitLine(l.value)) : polylineD(l.points!.map(project))
			);
	}

	function limitLine(value: number): Point[] {
		const py = plot.y + y!(value);
		return [
			{ x: plot.x - 1, y: py },
			{ x: plot.x + plot.width + 1, y: py }
		];
	}

	function isolineLabel(l: Isoline): string {
		const f = frame!;
		if (l.kind === 'quality') return `x ${compactNumber(l.value, 2)}`;
		if (l.kind === 'isentrope' || l.kind === 'isenthalp') {
			const unit = axisUnit(l.kind === 'isentrope' ? 's' : 'h', f.units, 'linear');
			return `${compactNumber(unit.fromSI(l.value, f.units.atmosphere), 4)} ${unit.label}`;
		}
		if (l.kind === 'isobar') {
			const unit = axisUnit('P', f.units, 'linear');
			return `${compactNumber(unit.fromSI(l.value, f.units.atmosphere))} ${unit.label}`;
		}
		if (l.kind === 'isotherm') {
			const unit = axisUnit('T', f.units, 'linear');
			return `${compactNumber(unit.fromSI(l.value, f.units.atmosphere), 4)} ${unit.label}`;
		}
		const unit = axisUnit('v', f.units, 'linear');
		return `${compactNumber(unit.fromSI(l.value, f.units.atmosphere))} ${unit.label}`;
	}

	// ---- path drawing (cheap: called on every drag answer)
	function drawPath() {
		if (!frame || !x || !y) return;
		const started = performance.now();
		const f = frame;
		const rows = computeKeyRows(f.width);
		if (rows !== keyRows) {
			drawFrame();
			return;
		}
		const sel = path.selection;
		const legPts = new Map(path.legs.map((l) => [l.id, l.points.map(project)]));
		stateShift = stackOffsets(
			path.states.map((s) => ({ id: s.id, ...project(s.state) })),
			STATE_R
		);

		gLegs.classed('is-preview', path.preview === true);
		gLegs
			.selectAll<SVGGElement, ChartLeg>('g.swc-leg')
			.data(path.legs, (d) => d.id)
			.join((enter) => {
				const g = enter.append('g').attr('class', 'swc-leg');
				g.append('path').attr('class', 'swc-leg-casing');
				g.append('path').attr('class', 'swc-leg-line');
				return g;
			})
			.classed('is-selected', (d) => sel?.kind === 'leg' && sel.id === d.id)
			.each(function (d) {
				const g = select(this);
				const st = processStyle(d.process);
				const dd = polylineD(legPts.get(d.id)!);
				const selected = sel?.kind === 'leg' && sel.id === d.id;
				g.select('.swc-leg-casing')
					.attr('d', dd)
					.attr('stroke-width', selected ? LEG_STROKE.casing + 5 : LEG_STROKE.casing);
				g.select('.swc-leg-line')
					.attr('d', dd)
					.attr('stroke', st.colour)
					.attr('stroke-width', selected ? LEG_STROKE.width + 0.75 : LEG_STROKE.width)
					.attr('stroke-dasharray', st.dash || null);
			});

		const crossings = path.legs.flatMap((l) =>
			l.crossings.map((c, i) => ({ key: `${l.id}:${i}`, p: project(c.state) }))
		);
		gCross
			.selectAll<SVGPathElement, (typeof crossings)[number]>('path')
			.data(crossings, (d) => d.key)
			.join('path')
			.attr('class', 'swc-crossing')
			.attr('d', diamond(4.5))
			.attr('transform', (d) => `translate(${d.p.x.toFixed(1)},${d.p.y.toFixed(1)})`);

		const vw = view();
		const traces = (path.traces ?? []).map((t) => ({
			id: t.id,
			revision: t.kind === 'revision',
			pts: t.points
				.filter((p) => drawable(vw, p))
				.map((p) => ({ ...project(p), inDome: !!p.inDome })),
			// a band across the dome needs v on an axis: elsewhere the reading has no known place
			bands: t.points
				.filter((p) => vw.x.prop === 'v' && p.vBand && !(p.v && p.v > 0))
				.map((p) => ({
					a: project({ v: p.vBand![0], T: p.T, P: p.P }),
					b: project({ v: p.vBand![1], T: p.T, P: p.P })
				}))
		}));
		gTraces
			.selectAll<SVGGElement, (typeof traces)[number]>('g')
			.data(traces, (d) => d.id)
			.join((enter) => {
				const g = enter.append('g');
				g.append('path').attr('class', 'swc-trace-line');
				g.append('path').attr('class', 'swc-trace-mark');
				g.append('path').attr('class', 'swc-trace-band');
				return g;
			})
			.each(function (d) {
				const g = select(this);
				g.select('.swc-trace-line')
					.attr('class', d.revision ? 'swc-trace-line swc-revision-line' : 'swc-trace-line')
					.attr('d', polylineD(d.pts));
				// readings on the saturation line: a band from v′ to v″ at their T or P (a few hundred at most)
				const bandEvery = Math.max(1, Math.ceil(d.bands.length / 200));
				g.select('.swc-trace-band').attr(
					'd',
					d.bands
						.filter((_, i) => i % bandEvery === 0)
						.map(
							(b) =>
								`M${b.a.x.toFixed(1)},${b.a.y.toFixed(1)}L${b.b.x.toFixed(1)},${b.b.y.toFixed(1)}`
						)
						.join('') || null
				);
				if (d.revision) {
					g.select('.swc-trace-mark').attr('d', null);
					return;
				}
				const every = Math.max(1, Math.ceil(d.pts.length / 120));
				const marks = d.pts
					.filter((_, i) => i % every === 0)
					.map((p) =>
						p.inDome
							? `M${(p.x + 2.2).toFixed(1)},${p.y.toFixed(1)}a2.2,2.2 0 1,0 -4.4,0a2.2,2.2 0 1,0 4.4,0`
							: `M${(p.x - 2.5).toFixed(1)},${p.y.toFixed(1)}h5M${p.x.toFixed(1)},${(p.y - 2.5).toFixed(1)}v5`
					)
					.join('');
				g.select('.swc-trace-mark').attr('d', marks);
			});

		gStates
			.selectAll<SVGGElement, ChartState>('g.swc-state')
			.data(path.states, (d) => d.id)
			.join((enter) => {
				const g = enter.append('g').attr('class', 'swc-state');
				g.append('circle')
					.attr('class', 'swc-state-ring')
					.attr('r', STATE_R + 3.5);
				g.append('circle').attr('class', 'swc-state-disc').attr('r', STATE_R);
				g.append('text').attr('class', 'swc-state-text').attr('dy', '0.36em');
				return g;
			})
			.classed('is-selected', (d) => sel?.kind === 'state' && sel.id === d.id)
			.attr('transform', (d) => {
				const p = shifted(d);
				return `translate(${p.x.toFixed(1)},${p.y.toFixed(1)})`;
			})
			.each(function (d) {
				const t = select(this).select('text');
				if (t.text() !== d.label)
					t.text(d.label).attr('font-size', d.label.length > 2 ? 7.5 : null);
			});

		drawFlags(legPts);
		// a drag (a preview every frame, the server's answers between) leaves the labels where the
		// last path drawn at rest put them, unless the frame moved under them: placing them is most
		// of a redraw's time, and the pointer's next move waits behind it
		if (!(path.preview || path.moving) || labelsStale) {
			drawLabels(
				legPts,
				crossings.map((c) => c.p)
			);
			labelsStale = false;
			labelsRev++;
		}
		drawKey();
		drawOverlay(legPts);
		// for benchmarks and tests: a redraw counter, its cost and whether it drew a preview, on the
		// overlay (never exported)
		ov.attr('data-path-rev', ++pathRev)
			.attr('data-labels-rev', labelsRev)
			.attr('data-path-ms', (performance.now() - started).toFixed(2))
			.attr('data-path-preview', path.preview ? 'true' : null);
	}

	/**
	 * Open review notes as numbered flags: beside the middle of a leg (by length, 11 px right and
	 * 3 px up, so it never hides the line) or up and right of a state's disc; the flag's bottom
	 * centre sits there, as the sheet page's note buttons over it do (NoteMarkers.svelte).
	 */
	function drawFlags(legPts: Map<string, Point[]>) {
		const states = new Map(path.states.map((s) => [s.id, s]));
		const flags = (path.flags ?? []).flatMap((f) => {
			let at: Point | null = null;
			if (f.target.kind === 'leg') {
				const pts = legPts.get(f.target.id);
				const mid = pts ? midpointByLength(pts) : null;
				if (mid) at = { x: mid.x + 11, y: mid.y - 3 };
			} else {
				const s = states.get(f.target.id);
				if (s) {
					const p = shifted(s);
					at = { x: p.x + 9, y: p.y - 9 };
				}
			}
			if (!at || !Number.isFinite(at.x) || !Number.isFinite(at.y)) return [];
			return [{ ...f, at, w: Math.max(18, 6.5 * String(f.count).length + 9) }];
		});
		gFlags
			.selectAll<SVGGElement, (typeof flags)[number]>('g.swc-note-flag')
			.data(flags, (d) => d.key)
			.join((enter) => {
				const g = enter.append('g').attr('class', 'swc-note-flag');
				g.append('title');
				g.append('path');
				g.append('text').attr('dy', '0.35em');
				return g;
			})
			.attr('data-anchor', (d) => d.key)
			.attr('transform', (d) => `translate(${d.at.x.toFixed(1)},${d.at.y.toFixed(1)})`)
			.each(function (d) {
				const g = select(this);
				const h = 18;
				const r = 4.5;
				const l = -d.w / 2;
				// rounded but for the bottom-left corner, which points at what the notes are on
				g.select('path').attr(
					'd',
					`M${l},0V${-h + r}Q${l},${-h} ${l + r},${-h}H${-l - r}Q${-l},${-h} ${-l},${-h + r}V${-r}Q${-l},0 ${-l - r},0Z`
				);
				g.select('text')
					.attr('y', -h / 2)
					.text(String(d.count));
				g.select('title').text(
					`${d.count} open review note${d.count > 1 ? 's' : ''} on ${d.label}`
				);
			});
	}

	/**
	 * Labels' boxes as the browser draws them: width and height of each text's bounding box and how
	 * far its top sits above the baseline; outside a browser (or before layout) an estimate. New
	 * texts are measured together (one layout), then remembered; the memory is cleared when the web
	 * fonts arrive.
	 */
	const measured = new Map<string, { width: number; height: number; ascent: number }>();
	let lastMaskKey = '';
	function measureAll(items: { text: string; cls: string; fontSize: number; mono: boolean }[]) {
		const key = (i: { text: string; cls: string }) => `${i.cls}|${i.text}`;
		const missing = items.filter((i) => !measured.has(key(i)));
		if (missing.length) {
			const els = missing.map(
				(i) =>
					gLabels
						.append('text')
						.attr('class', i.cls)
						.attr('visibility', 'hidden')
						.text(i.text)
						.node() as SVGTextElement & { getBBox?: () => DOMRect }
			);
			missing.forEach((i, n) => {
				let out = {
					width:
						textWidth(i.text, i.fontSize, i.mono) +
						(i.mono ? 0 : i.text.length * 0.05 * i.fontSize),
					height: Math.ceil(i.fontSize * 1.32),
					ascent: i.fontSize * 1.02
				};
				try {
					const b = typeof els[n].getBBox === 'function' ? els[n].getBBox!() : null;
					if (b && b.width > 0 && b.height > 0)
						out = { width: b.width, height: b.height, ascent: -b.y };
				} catch {
					// not laid out (a detached or hidden drawing): keep the estimate
				}
				measured.set(key(i), out);
			});
			for (const el of els) el.remove();
		}
		return items.map((i) => measured.get(key(i))!);
	}

	function drawLabels(legPts: Map<string, Point[]>, crossingPts: Point[]) {
		const f = frame!;
		const marks: Rect[] = [];
		for (const s of path.states) {
			const p = shifted(s);
			marks.push({
				x: p.x - STATE_R - 3,
				y: p.y - STATE_R - 3,
				width: 2 * STATE_R + 6,
				height: 2 * STATE_R + 6
			});
		}
		for (const p of crossingPts) marks.push({ x: p.x - 5, y: p.y - 5, width: 10, height: 10 });
		const sat =
			f.saturation && f.saturation.liquid.length > 1 && f.saturation.vapor.length > 1
				? f.saturation
				: null;
		const cpAt = sat ? project(sat.critical) : null;
		if (cpAt) marks.push({ x: cpAt.x - 4.5, y: cpAt.y - 4.5, width: 9, height: 9 });

		const lims = drawnLimits();
		const limLines = lims.map((l) => (l.straight ? limitLine(l.value) : l.points!.map(project)));
		const vw = view();
		const iso = f.isolines ?? [];
		const isoLines = iso.map((l) => l.points.filter((p) => drawable(vw, p)).map(project));
		const lines: Point[][] = [...limLines];
		if (sat) {
			lines.push([...sat.liquid, sat.critical, ...[...sat.vapor].reverse()].map(project));
			lines.push([project(sat.liquid[0]), project(sat.vapor[0])]);
		}
		for (const t of path.traces ?? [])
			lines.push(t.points.filter((p) => drawable(vw, p)).map(project));

		const limText = lims.map((l) => limitText(l.name, l.value, f.units));
		const isoText = iso.map((l) => isolineLabel(l));
		const sizes = measureAll([
			{ text: 'c.p.', cls: 'swc-cp-label', fontSize: 10.5, mono: false },
			...limText.map((text) => ({ text, cls: 'swc-limit-label', fontSize: 10.5, mono: false })),
			...isoText.map((text) => ({ text, cls: 'swc-iso-label', fontSize: 9.5, mono: true }))
		]);
		const cpSize = sizes[0];
		const limSize = sizes.slice(1, 1 + limText.length);
		const isoSize = sizes.slice(1 + limText.length);
		const limReqs: LabelRequest[] = lims.map((l, i) => {
			const { width, height } = limSize[i];
			const line = limLines[i];
			return {
				id: l.name,
				width: width + 2,
				height,
				line,
				prefer: 'end',
				anchors: l.straight ? [] : levelAnchors(line, width + 2)
			};
		});
		const isoReqs: LabelRequest[] = iso.map((_, i) => ({
			id: `${i}`,
			width: isoSize[i].width + 2,
			height: isoSize[i].height,
			line: isoLines[i],
			prefer: 'end'
		}));
		const cpInside =
			cpAt &&
			cpAt.x >= plot.x &&
			cpAt.x <= plot.x + plot.width &&
			cpAt.y >= plot.y &&
			cpAt.y <= plot.y + plot.height;

		const placed = placeChartLabels(
			{ plot, lines, background: isoLines, path: [...legPts.values()], marks },
			{
				limits: limReqs,
				near: cpInside ? { point: cpAt!, width: cpSize.width + 2, height: cpSize.height } : null,
				edges: isoReqs
			}
		);

		// the mask is touched only when a hole moves (a masked group is costly to repaint while dragging)
		const maskKey =
			`${f.width}x${f.height}:` +
			placed.masks
				.map(
					(m) => `${m.x.toFixed(1)},${m.y.toFixed(1)},${m.width.toFixed(1)},${m.height.toFixed(1)}`
				)
				.join(';');
		if (maskKey !== lastMaskKey) {
			lastMaskKey = maskKey;
			isoMaskAll.attr('x', 0).attr('y', 0).attr('width', f.width).attr('height', f.height);
			isoMask
				.selectAll<SVGRectElement, Rect>('rect.swc-mask-hole')
				.data(placed.masks)
				.join('rect')
				.attr('class', 'swc-mask-hole')
				.attr('fill', 'black')
				.attr('x', (d) => d.x)
				.attr('y', (d) => d.y)
				.attr('width', (d) => d.width)
				.attr('height', (d) => d.height);
		}

		// text drawn so that its bounding box is the placed box: 1 px in from the left, top at the box's top
		gLabels
			.selectAll<SVGTextElement, LabelPlacement>('text.swc-limit-label')
			.data(placed.limits, (d) => d.id)
			.join('text')
			.attr('class', 'swc-limit-label')
			.attr('data-label', (d) => d.id)
			.attr('x', (d) => d.box.x + 1)
			.attr('y', (d) => d.box.y + limSize[lims.findIndex((l) => l.name === d.id)].ascent)
			.text((d) => limText[lims.findIndex((l) => l.name === d.id)]);

		const cpBox = placed.near;
		cpLabel.attr('visibility', cpBox ? null : 'hidden');
		if (cpBox) cpLabel.attr('x', cpBox.x + 1).attr('y', cpBox.y + cpSize.ascent);

		gLabels
			.selectAll<SVGTextElement, LabelPlacement>('text.swc-iso-label')
			.data(placed.edges, (d) => d.id)
			.join('text')
			.attr('class', 'swc-iso-label')
			.attr('x', (d) => d.box.x + 1)
			.attr('y', (d) => d.box.y + isoSize[Number(d.id)].ascent)
			.text((d) => isoText[Number(d.id)]);
	}

	function drawKey() {
		const f = frame!;
		const { slots } = layoutKey(currentKeyEntries(), f.width - MARGIN.left - MARGIN.right);
		const top = 12;
		gKey
			.selectAll<SVGGElement, (typeof slots)[number]>('g')
			.data(slots, (d) => d.entry.text)
			.join((enter) => {
				const g = enter.append('g');
				g.append('path').attr('class', 'sample');
				g.append('text').attr('class', 'swc-key-text').attr('dy', '0.34em');
				return g;
			})
			.attr('transform', (d) => `translate(${plot.x + d.x},${top + d.row * KEY.row})`)
			.each(function (d) {
				const g = select(this);
				const sample = g.select('path.sample');
				const e = d.entry;
				sample
					.attr('class', 'sample')
					.attr('stroke', null)
					.attr('stroke-dasharray', null)
					.attr('stroke-width', null)
					.attr('fill', null)
					.attr('stroke-linecap', null);
				if (e.kind === 'process') {
					const st = processStyle(e.process);
					sample
						.attr('d', `M1,0h${KEY.sample - 2}`)
						.attr('fill', 'none')
						.attr('stroke', st.colour)
						.attr('stroke-width', LEG_STROKE.width)
						.attr('stroke-linecap', 'round')
						.attr('stroke-dasharray', st.dash || null);
				} else if (e.kind === 'crossing') {
					sample
						.attr('class', 'sample swc-crossing')
						.attr('d', `M${KEY.sample / 2},-4.5l4.5,4.5l-4.5,4.5l-4.5,-4.5Z`);
				} else if (e.kind === 'limit') {
					sample
						.attr('class', 'sample swc-limit')
						.attr('d', `M0,0h${KEY.sample}`)
						.attr('stroke-width', LIMIT_STROKE.width)
						.attr('stroke-dasharray', '9 4');
				} else if (e.kind === 'trace-band') {
					sample.attr('class', 'sample swc-trace-band').attr('d', `M3,0h${KEY.sample - 6}`);
				} else if (e.kind === 'revision') {
					sample.attr('class', 'sample swc-revision-line').attr('d', `M3,0h${KEY.sample - 6}`);
				} else if (e.kind === 'note-flag') {
					// the flag's own shape, smaller: rounded but for the corner that points at the notes
					const l = KEY.sample / 2 - 7;
					sample
						.attr('class', 'sample swc-note-flag-sample')
						.attr(
							'd',
							`M${l},5V-2Q${l},-5 ${l + 3},-5H${l + 11}Q${l + 14},-5 ${l + 14},-2V2Q${l + 14},5 ${l + 11},5Z`
						);
				} else {
					sample
						.attr('class', 'sample swc-trace-mark')
						.attr('d', `M3,0h20M${KEY.sample / 2 - 2.5},0h5M${KEY.sample / 2},-2.5v5`);
				}
				g.select('text')
					.attr('x', KEY.sample + KEY.gap)
					.text(e.text);
			});
	}

	// ---- overlay: focusable marks, drag, keyboard
	function drawOverlay(legPts: Map<string, Point[]>) {
		const f = frame!;
		const sel = path.selection;
		ov.classed('is-adding', interaction.mode === 'add-leg');
		hitLegs
			.selectAll<SVGPathElement, ChartLeg>('path')
			.data(path.legs, (d) => d.id)
			.join((enter) =>
				enter
					.append('path')
					.attr('class', 'swc-hit-leg')
					.attr('tabindex', 0)
					.attr('role', 'button')
					.on('click', (ev: MouseEvent, d) => {
						ev.stopPropagation();
						handlers.select({ kind: 'leg', id: d.id });
					})
					.on('keydown', (ev: KeyboardEvent, d) => onKey(ev, { kind: 'leg', id: d.id }))
			)
			.attr('d', (d) => polylineD(legPts.get(d.id)!))
			.attr('aria-label', (d) => legAriaLabel(d, path.states))
			.attr('aria-pressed', (d) => String(sel?.kind === 'leg' && sel.id === d.id));

		hitStates
			.selectAll<SVGCircleElement, ChartState>('circle')
			.data(path.states, (d) => d.id)
			.join((enter) =>
				enter
					.append('circle')
					.attr('class', 'swc-hit-state')
					.attr('r', STATE_R + 4)
					.attr('tabindex', 0)
					.attr('role', 'button')
					.on('keydown', (ev: KeyboardEvent, d) => onKey(ev, { kind: 'state', id: d.id }))
					.call(stateDrag)
			)
			.classed('is-locked', (d) => !interaction.canDrag(d.id))
			.attr('cx', (d) => shifted(d).x)
			.attr('cy', (d) => shifted(d).y)
			.attr('aria-label', (d) => {
				const beside = stateShift.get(d.id)?.beside;
				const other = beside ? path.states.find((s) => s.id === beside)?.label : undefined;
				return (
					stateAriaLabel(d, f.units) +
					(other ? `; the same point as ${other}, drawn beside it` : '')
				);
			})
			.attr('aria-pressed', (d) => String(sel?.kind === 'state' && sel.id === d.id));
	}

	const stateDrag = drag<SVGCircleElement, ChartState>()
		.container(() => overlay as unknown as SVGGElement)
		.subject((ev: { x: number; y: number }) => ({ x: ev.x, y: ev.y }))
		.on('start', (_ev, d) => {
			dragging = { id: d.id, moved: false, off: stateShift.get(d.id) ?? { x: 0, y: 0 } };
		})
		.on('drag', (ev, d) => {
			if (!dragging || !interaction.canDrag(d.id)) return;
			const { coords, reason } = clamp(dataAt(ev.x - dragging.off.x, ev.y - dragging.off.y));
			const e: StateDragEvent = { stateId: d.id, coords, reason };
			const g = toScreen(coords);
			ghost.style('display', null).classed('is-clamped', reason !== null);
			if (g) ghost.attr('cx', g.x).attr('cy', g.y);
			if (!dragging.moved) {
				dragging.moved = true;
				handlers.dragStart(e);
			}
			handlers.drag(e);
		})
		.on('end', (ev, d) => {
			const was = dragging;
			dragging = null;
			ghost.style('display', 'none');
			if (was?.moved) {
				const { coords, reason } = clamp(dataAt(ev.x - was.off.x, ev.y - was.off.y));
				handlers.dragEnd({ stateId: d.id, coords, reason });
			} else handlers.select({ kind: 'state', id: d.id });
		});

	function onKey(ev: KeyboardEvent, target: ChartSelection) {
		const dirs: Record<string, NudgeEvent['direction']> = {
			ArrowLeft: 'left',
			ArrowRight: 'right',
			ArrowUp: 'up',
			ArrowDown: 'down'
		};
		if (ev.key === 'Enter' || ev.key === ' ') {
			ev.preventDefault();
			handlers.select(target);
			return;
		}
		if (ev.key === 'Escape') {
			handlers.select(null);
			return;
		}
		const direction = dirs[ev.key];
		if (!direction) return;
		ev.preventDefault();
		const stateId =
			target.kind === 'state' ? target.id : path.legs.find((l) => l.id === target.id)?.to;
		const st = path.states.find((s) => s.id === stateId);
		if (!st || !stateId) return;
		const step: NudgeEvent['step'] = ev.altKey ? 'fine' : ev.shiftKey ? 'coarse' : 'normal';
		const p = project(st.state);
		const d = NUDGE_PX[step];
		const moved = {
			x: p.x + (direction === 'left' ? -d : direction === 'right' ? d : 0),
			y: p.y + (direction === 'up' ? -d : direction === 'down' ? d : 0)
		};
		const { coords, reason } = clamp(dataAt(moved.x, moved.y));
		handlers.nudge({ target, stateId, direction, step, coords, reason });
	}

	function toScreen(c: ChartCoords): Point | null {
		if (!frame || !x || !y) return null;
		if (!drawable(view(), c)) return null;
		return project(c);
	}

	// ---- zoom, pan, hover, add
	const zoomer: ZoomBehavior<SVGSVGElement, unknown> = zoom<SVGSVGElement, unknown>()
		.scaleExtent([0.5, 200])
		.filter((ev: Event) => {
			if (ev.type === 'wheel' || ev.type.startsWith('touch')) return true;
			const t = ev.target as Element;
			return t === bg.node() && !(ev as MouseEvent).button && !(ev as MouseEvent).ctrlKey;
		})
		.on('zoom', (ev) => {
			transform = ev.transform;
			drawFrame();
			// the readout follows: the data under a still pointer changed
			const src = ev.sourceEvent as MouseEvent | null;
			if (src && 'clientX' in src) lastPointer = pointer(src, overlay);
			if (lastPointer) hoverAt(lastPointer[0], lastPointer[1]);
		});
	ov.call(zoomer).on('dblclick.zoom', null);
	ov.on('dblclick', (ev: MouseEvent) => {
		if (ev.target === bg.node() && interaction.mode === 'select') resetView();
	});
	bg.on('click', (ev: MouseEvent) => {
		if (!frame || !x) return;
		const [px, py] = pointer(ev, overlay);
		if (interaction.mode === 'add-leg') handlers.add(clamp(dataAt(px, py)));
		else handlers.select(null);
	});
	let lastPointer: [number, number] | null = null;
	ov.on('pointermove', (ev: PointerEvent) => {
		if (!frame || !x) return;
		lastPointer = pointer(ev, overlay);
		hoverAt(lastPointer[0], lastPointer[1]);
	});
	ov.on('pointerleave', () => {
		lastPointer = null;
		hideHover();
	});

	function hoverAt(px: number, py: number) {
		if (!frame || !x) return;
		const inside =
			px >= plot.x && px <= plot.x + plot.width && py >= plot.y && py <= plot.y + plot.height;
		if (!inside) {
			hideHover();
			return;
		}
		crossV
			.style('display', null)
			.attr('x1', px)
			.attr('x2', px)
			.attr('y1', plot.y)
			.attr('y2', plot.y + plot.height);
		crossH
			.style('display', null)
			.attr('y1', py)
			.attr('y2', py)
			.attr('x1', plot.x)
			.attr('x2', plot.x + plot.width);
		const raw = dataAt(px, py);
		handlers.hover({ coords: raw, reason: clamp(raw).reason });
	}

	function hideHover() {
		crossV.style('display', 'none');
		crossH.style('display', 'none');
		handlers.hover(null);
	}

	function resetView() {
		if (!frame) return;
		baseDomain =
			frame.domain ??
			fitDomain(frame.kind, frame.pressureScale, {
				saturation: frame.saturation,
				triple: frame.triple,
				states: path.states,
				legs: path.legs,
				limits: frame.limits
			});
		transform = zoomIdentity;
		ov.property('__zoom', zoomIdentity);
		drawFrame();
	}

	return {
		setFrame(next) {
			frame = next;
			drawFrame();
		},
		setPath(next) {
			path = next;
			if (!frame) return;
			if (
				!fittedWithPath &&
				next.states.length > 0 &&
				!frame.domain &&
				transform.k === 1 &&
				transform.x === 0 &&
				transform.y === 0
			) {
				fittedWithPath = true;
				baseDomain = fitDomain(frame.kind, frame.pressureScale, {
					saturation: frame.saturation,
					triple: frame.triple,
					states: path.states,
					legs: path.legs,
					limits: frame.limits
				});
				drawFrame();
				return;
			}
			drawPath();
		},
		setInteraction(next) {
			interaction = next;
			if (frame && x) drawPath();
		},
		resetView,
		plotRect: () => ({ ...plot }),
		toScreen,
		destroy() {
			destroyed = true;
			ov.on('.zoom', null).on('pointermove', null).on('pointerleave', null).on('dblclick', null);
			svg.selectAll('*:not(title):not(desc)').remove();
			ov.selectAll('*').remove();
		}
	};
}
