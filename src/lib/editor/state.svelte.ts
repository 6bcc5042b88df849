/**
 * The sketcher's state: one sheet being read or edited. The page, the chart, the table and the
 * panels all read and change the sheet through this object, so every edit takes one path:
 * build the next document → compute it (POST /api/v1/paths; the engine in the browser for a
 * sheet without legs) → on success make it the document, push it on the undo stack and hand it
 * to autosave; on failure keep the old one and say why. Drags are live: once a frame (the latest
 * pointer move wins) the browser's engine recomputes the legs the move changes and the chart
 * redraws that preview at once (preview.ts); the same move asks the server through a coalescer
 * (one request in flight and at most one started per DRAG_ASK_SPACING_MS, the newest position
 * waiting, stale answers dropped; the release is sent at once), and the server's
 * answer replaces the preview and fills the table and warnings. Only the server's answers ever
 * become the document's result; the gesture is one undo step.
 *
 * Extending (revisions, notes, traces): read `doc`, `view`, `selection`; draw over the chart by
 * setting `traces`; add panel tabs on the page (see SheetPanel.svelte).
 */
import type { AddPointEvent, NudgeEvent, StateDragEvent } from '$lib/charts/chart';
import { fitDomain } from '$lib/charts/scales';
import { pairInputs, VIEWS } from '$lib/charts/views';
import type {
	ChartCoords,
	ChartKind,
	ChartSelection,
	DesignLimits as ChartLimits,
	Isoline,
	IsolineKind,
	MeasuredTrace,
	SaturationCurve
} from '$lib/charts/types';
import type { FluidInfo, Formulation, Inputs, PathResult, Process, State } from '$lib/thermo/types';
import type { UnitPrefs } from '$lib/units/prefs';
import { Autosave, readLocalCopy, type AutosaveState, type KeyValueStore } from './autosave';
import type { ChartData, ChartDataRef } from '$lib/chart-data';
import { withLegPoints, type LegPoints, type LegPointsRef } from '$lib/sheets/leg-points';
import {
	ApiError,
	apiCall,
	getIsolines,
	getSaturation,
	getSheetDraft,
	OfflineError,
	postPath,
	putDraft
} from './client';
import { createCoalescer, type Coalescer } from './coalescer';
import {
	cloneDoc,
	engineSpec,
	labelIds,
	MAX_SHEET_LEGS,
	newLegId,
	sameDoc,
	sameSpec,
	firstStateResult,
	stateIndex,
	stateKey,
	targetOf,
	viewOf,
	type EditableProp,
	type PathView
} from '$lib/sheets/doc';
import { History } from './history';
import {
	startCandidatesOf,
	startOptions,
	withoutStartChoice,
	withStartChoice,
	withWindow,
	type StateCandidate
} from '$lib/sheets/choice';
import * as edits from './edits';
import type { Edit } from './edits';
import { frameLimits, frameLines } from '$lib/sheets/frame';
import {
	defaultTargetKind,
	projectOntoLeg,
	targetFor,
	valueOf,
	type FixFn,
	type ScreenMetric
} from './targets';
import type {
	ChartPrefs,
	SheetDoc,
	SheetLegSpec,
	SheetStatus,
	TitleBlockFields
} from '$lib/sheets/types';
import { fillStart, type FillSpec } from '$lib/sheets/fill';
import { readAcrossSaturation, type SaturationReading } from '$lib/sheets/saturation-input';
import { saturationTarget } from '$lib/sheets/saturation-target';
import { previewPath, type PathPreview } from './preview';

/**
 * The engine in the browser: loaded after the page (browser.ts), with IAPWS-IF97 beside it only for
 * a water sheet by IF97 (browser-if97.ts).
 */
type Engine = typeof import('$lib/thermo/browser') &
	Partial<typeof import('$lib/thermo/browser-if97')>;

/** Points per leg while dragging (the engine's least): half the work per answer; the end of the gesture redraws at full detail. */
const DRAG_SAMPLES = 20;
/** A drag preview stops adding legs after this long (a long path dragged near its start); the server's answer draws the rest. */
const PREVIEW_BUDGET_MS = 10;
/**
 * During a drag the server is asked at most this often (the browser's preview draws every move;
 * the answers fill the table and warnings). Each answer costs the page a redraw of the path, the
 * table and the warnings: at one per server round trip they met about half the pointer moves
 * half-way and pushed the move-to-redraw time past a frame. The release is sent at once.
 */
const DRAG_ASK_SPACING_MS = 100;

/** Once a frame in a browser; elsewhere (unit tests, server) a timer of about one frame. */
const nextFrame = (f: () => void): (() => void) => {
	if (typeof requestAnimationFrame === 'function') {
		const id = requestAnimationFrame(f);
		return () => cancelAnimationFrame(id);
	}
	const id = setTimeout(f, 16);
	return () => clearTimeout(id);
};

export interface EditorInit {
	team: string;
	sheetId: string;
	number: number;
	title: string;
	status: SheetStatus;
	doc: SheetDoc;
	version: number;
	updatedAt: number;
	updatedBy: string;
	/** the draft computed on the server for the first paint, or why it could not be */
	result: PathResult | null;
	resultError: string | null;
	/** where the first paint's leg points are when `result` came without them (loadPoints fetches them) */
	points?: LegPointsRef | null;
	canEdit: boolean;
	fluid: FluidInfo;
	/** where the dome and the fluid list are (loadChartData fetches them after the first paint) */
	chartData: ChartDataRef;
}

export type Outcome = { ok: true; note?: string | null } | { ok: false; message: string };

/** What a drag is moving. */
interface Drag {
	kind: 'state' | 'new-leg';
	/** anchor key of the state dragged (for a new leg: its id) */
	key: string;
	chart: ChartKind;
	metric: ScreenMetric;
	base: SheetDoc;
	baseView: PathView | null;
	/** the target kind the leg had when the drag began (kept where it can hold the end) */
	wanted: EditableProp | null;
	/** v of the last projected end: the next projection searches near it */
	hint?: number;
	/** the newest document the server answered for */
	live: SheetDoc | null;
}

interface Candidate {
	doc: SheetDoc;
	note: string | null;
	/** which pointer move of the gesture it is for (1, 2, …): orders previews and answers */
	seq?: number;
}

/** A preview on the chart, and the move it was computed for. */
export type DragPreview = PathPreview & { seq: number };

/** A leg marked "to saturation" whose target was changed since (typed, dragged) is an ordinary leg again. */
function keepSaturationMarks(doc: SheetDoc): SheetDoc {
	const stale = (l: SheetLegSpec) =>
		l.to === 'saturation' &&
		!(Object.keys(l.target).length === 1 && (l.target.x === 0 || l.target.x === 1));
	if (!doc.spec.legs.some(stale)) return doc;
	const next = cloneDoc(doc);
	for (const l of next.spec.legs) if (stale(l)) delete l.to;
	return next;
}

function messageOf(e: unknown, legs: readonly { id: string }[]): string {
	if (e instanceof OfflineError)
		return 'No connection to the server: the path cannot be computed right now, so the edit was not applied.';
	if (e instanceof ApiError) return labelIds(e.message, legs);
	if (e instanceof Error) return labelIds(e.message, legs);
	return String(e);
}

export class SheetEditor {
	readonly team: string;
	readonly sheetId: string;
	readonly number: number;
	readonly canEdit: boolean;
	/** every fluid, for the picker: the sheet's own until loadChartData brings the list */
	fluids = $state.raw<FluidInfo[]>([]);
	readonly #chartData: ChartDataRef;
	/** the first paint's leg points still to fetch, and the view drawn without them */
	#points: { ref: LegPointsRef; view: PathView } | null = null;

	title = $state('');
	status = $state<SheetStatus>('draft');

	/** the document shown (during a drag: the live one) */
	doc = $state.raw<SheetDoc>(null as unknown as SheetDoc);
	/** its computed path (null if it could not be computed: `computeError` says why) */
	view = $state.raw<PathView | null>(null);
	/**
	 * While dragging: the path as the browser's engine computed it for the newest pointer move,
	 * drawn on the charts instead of `view` until the server answers for that move or a later one.
	 * For drawing only: it never becomes `view`, the table, a warning or a saved result.
	 */
	preview = $state.raw<DragPreview | null>(null);
	/** the view of the committed document (isolines and the chart window follow it, not a drag) */
	committedView = $state.raw<PathView | null>(null);
	computeError = $state<string | null>(null);
	/**
	 * S1's pair of the last edit met several states (within the sheet's window): the document that
	 * was refused and the states to pick from (pickStart); null otherwise.
	 */
	startChoice = $state.raw<{ doc: SheetDoc; candidates: StateCandidate[] } | null>(null);
	/** a committed edit is being computed */
	busy = $state(false);

	fluid = $state.raw<FluidInfo>(null as unknown as FluidInfo);
	/** the fluid's own dome (its chart data); the charts draw `dome` */
	saturation = $state.raw<SaturationCurve | null>(null);
	/** water's dome by IAPWS-IF97, made once by the browser's engine for an IF97 sheet */
	#if97Dome: SaturationCurve | null = null;

	/**
	 * The dome the charts draw and frame: on a water sheet by IAPWS-IF97 IF97's own (once the engine
	 * has loaded; the fluid's until then), else the fluid's own.
	 */
	get dome(): SaturationCurve | null {
		if (!this.#wantsIf97() || !this.engine) return this.saturation;
		if (!this.engine.if97SaturationCurve) {
			// the sheet became IF97 after the engine loaded: load IF97 beside it (drawn when it comes)
			queueMicrotask(() => void this.loadEngine());
			return this.saturation;
		}
		if (!this.#if97Dome)
			try {
				this.#if97Dome = this.engine.if97SaturationCurve(100);
			} catch {
				return this.saturation;
			}
		return this.#if97Dome;
	}
	/** background lines by kind, for the kinds the shown views draw (chart-views.ts) */
	isolines = $state.raw<Partial<Record<IsolineKind, Isoline[]>>>({});
	limitCurves = $state.raw<{ isobars: Isoline[]; isotherms: Isoline[] }>({
		isobars: [],
		isotherms: []
	});

	selection = $state<ChartSelection | null>(null);
	mode = $state<'select' | 'add-leg'>('select');
	addProcess = $state<Process>('isochoric');
	addN = $state(1.3);
	/** what the last drag or chart edit ran into (shown for a few seconds) */
	chartNote = $state<{ text: string; kind: 'info' | 'caution' } | null>(null);
	/** a one-line message under the header (restored local copy, loaded draft …) */
	notice = $state<{ text: string; kind: 'ok' | 'info' | 'caution' } | null>(null);
	dragging = $state(false);

	save = $state<AutosaveState>({
		status: 'saved',
		version: 1,
		savedAt: null,
		message: null,
		conflict: null
	});
	updatedAt = $state(0);
	updatedBy = $state('');
	/** a local copy from an older version than the server's, waiting for the person to decide */
	recovery = $state.raw<{ doc: SheetDoc; baseVersion: number; changedAt: number } | null>(null);
	/** theirs, when comparing after a conflict */
	theirs = $state.raw<{
		doc: SheetDoc;
		version: number;
		updatedAt: number;
		updatedBy: string;
	} | null>(null);

	/** drawn over the path on both charts (measured traces, a revision to compare with …) */
	traces = $state.raw<MeasuredTrace[]>([]);

	engine = $state.raw<Engine | null>(null);

	#history: History<SheetDoc>;
	#historyRev = $state(0);
	#autosave: Autosave<SheetDoc> | null = null;
	#queue: Promise<unknown> = Promise.resolve();
	#drag: Drag | null = null;
	/** the newest pointer move of the drag, waiting for the next frame */
	#pendingMove: StateDragEvent | null = null;
	#cancelFrame: (() => void) | null = null;
	#moveSeq = 0;
	#coalescer: Coalescer<Candidate>;
	#noteTimer: ReturnType<typeof setTimeout> | undefined;
	#isoKey = '';
	#limitKey = '';

	constructor(init: EditorInit) {
		this.team = init.team;
		this.sheetId = init.sheetId;
		this.number = init.number;
		this.canEdit = init.canEdit;
		this.fluids = [init.fluid];
		this.#chartData = init.chartData;
		this.title = init.title;
		this.status = init.status;
		this.doc = init.doc;
		this.fluid = init.fluid;
		this.updatedAt = init.updatedAt;
		this.updatedBy = init.updatedBy;
		this.save = {
			status: 'saved',
			version: init.version,
			savedAt: null,
			message: null,
			conflict: null
		};
		if (init.result) {
			this.view = viewOf(init.doc.spec, init.result);
			this.committedView = this.view;
			if (init.points) this.#points = { ref: init.points, view: this.view };
		}
		this.computeError = init.resultError;
		this.#history = new History(init.doc, { limit: 200, same: sameDoc });
		this.#coalescer = createCoalescer<Candidate, { view: PathView; candidate: Candidate }>(
			async (c) => ({ view: await this.#compute(c.doc, DRAG_SAMPLES), candidate: c }),
			{
				result: ({ view, candidate }) => {
					if (!this.#drag) return;
					this.#drag.live = candidate.doc;
					this.doc = candidate.doc;
					this.view = view;
					// the server's answer replaces a preview of this move or an earlier one (a
					// preview of a later move stays: the chart does not step back)
					if (this.preview && this.preview.seq <= (candidate.seq ?? Infinity)) this.preview = null;
					if (candidate.note) this.#note(candidate.note, 'info');
				},
				error: (e, candidate) => {
					if (!this.#drag) return;
					// the server refused the very move the preview shows: its last answer is drawn
					if (this.preview && this.preview.seq === candidate.seq) this.preview = null;
					this.#note(
						`Not there: ${messageOf(e, this.#drag.base.spec.legs)} The last valid path stays drawn.`,
						'caution'
					);
				}
			},
			{ minIntervalMs: DRAG_ASK_SPACING_MS }
		);
	}

	// ---- lifecycle (browser only) -------------------------------------------------------------

	/** Start autosave, replay a local copy, load the engine. Call once, in the browser. */
	start(storage: KeyValueStore | null): () => void {
		if (this.canEdit) {
			this.#autosave = new Autosave<SheetDoc>(this.save.version, {
				save: async (doc, v) => {
					const r = await putDraft(this.team, this.sheetId, v, doc);
					this.updatedAt = r.updatedAt;
					this.updatedBy = r.updatedBy;
					return r;
				},
				storage,
				key: `sw:draft:${this.sheetId}`,
				onState: (s) => (this.save = s)
			});
			const local = readLocalCopy<SheetDoc>(storage, `sw:draft:${this.sheetId}`);
			if (local && !sameDoc(local.doc, this.doc)) {
				if (local.baseVersion === this.save.version) void this.#replay(local.doc);
				else this.recovery = local;
			} else if (local) storage?.removeItem(`sw:draft:${this.sheetId}`);
		}
		void this.loadEngine();
		return () => {
			this.#autosave?.dispose();
			clearTimeout(this.#noteTimer);
		};
	}

	/** A water sheet by IAPWS-IF97: the browser's engine needs IF97 beside it. */
	#wantsIf97(): boolean {
		const spec = this.doc.spec;
		return spec.fluid === 'water' && spec.formulation === 'if97';
	}

	async loadEngine(): Promise<Engine> {
		const if97 = this.#wantsIf97();
		if (this.engine && (!if97 || this.engine.if97Fix)) return this.engine;
		const [base, extra] = await Promise.all([
			import('$lib/thermo/browser'),
			if97 ? import('$lib/thermo/browser-if97') : null
		]);
		// a call that finished meanwhile may have added IF97: keep it
		this.engine = { ...base, ...this.engine, ...extra };
		return this.engine;
	}

	/** Save now (leaving the page, or the connection came back). */
	flush(): void {
		void this.#autosave?.flush();
	}
	online(): void {
		this.#autosave?.online();
	}
	/** True while something is not on the server yet. */
	get unsaved(): boolean {
		return this.#autosave?.dirty ?? false;
	}

	async #replay(doc: SheetDoc) {
		const r = await this.commit(doc);
		if (r.ok)
			this.notice = {
				kind: 'info',
				text: 'Restored edits kept in this browser that had not reached the server; saving them now.'
			};
		else this.recovery = { doc, baseVersion: this.save.version, changedAt: Date.now() };
	}

	// ---- computing ----------------------------------------------------------------------------

	/** The path of `doc`: the server's answer (fewer points per leg while dragging), or S1 alone from the browser's engine. */
	async #compute(doc: SheetDoc, samples?: number): Promise<PathView> {
		if (doc.spec.legs.length === 0) {
			const result = firstStateResult(doc, await this.loadEngine(), startOptions(doc.spec));
			return {
				result,
				states: [{ id: 'start', label: 'S1', state: result.states[0].state }],
				legs: []
			};
		}
		const spec = engineSpec(doc);
		if (
			samples !== undefined &&
			spec.samples === undefined &&
			spec.legs.every((l) => l.samples === undefined)
		)
			spec.samples = samples;
		const result = await postPath(spec);
		return viewOf(doc.spec, result);
	}

	/** Recompute the current document at full detail (after a drag drew it with fewer points). */
	async #refine(): Promise<void> {
		const doc = this.doc;
		try {
			const view = await this.#compute(doc);
			if (this.doc === doc && !this.#drag) {
				this.view = view;
				this.committedView = view;
			}
		} catch {
			// the drag's view stays; the next edit recomputes anyway
		}
	}

	#note(text: string, kind: 'info' | 'caution' = 'info', ms = 6000) {
		clearTimeout(this.#noteTimer);
		this.chartNote = { text, kind };
		this.#noteTimer = setTimeout(() => (this.chartNote = null), ms);
	}

	/** Run edits one after another (each computes against the one before). */
	#serial<T>(f: () => Promise<T>): Promise<T> {
		const p = this.#queue.then(f, f);
		this.#queue = p.catch(() => undefined);
		return p;
	}

	/**
	 * Make `next` the document, if it computes: the one way every edit is applied. Documents
	 * with the same spec (title block, units, chart settings) need no computing.
	 */
	commit(next: SheetDoc): Promise<Outcome> {
		next = keepSaturationMarks(next);
		return this.#serial(async () => {
			if (!this.canEdit)
				return { ok: false, message: 'Your role can read this sheet but not edit it.' };
			if (sameDoc(next, this.doc)) return { ok: true };
			if (sameSpec(next, this.doc) && this.view) {
				this.#apply(next, this.view);
				return { ok: true };
			}
			this.busy = true;
			try {
				const view = await this.#compute(next);
				this.#apply(next, view);
				return { ok: true };
			} catch (e) {
				const candidates = startCandidatesOf(e);
				this.startChoice = candidates ? { doc: next, candidates } : null;
				return { ok: false, message: messageOf(e, next.spec.legs) };
			} finally {
				this.busy = false;
			}
		});
	}

	#apply(next: SheetDoc, view: PathView) {
		this.doc = next;
		this.view = view;
		this.committedView = view;
		this.computeError = null;
		this.startChoice = null;
		if (this.#history.push(next)) this.#historyRev++;
		this.#autosave?.change(next);
		this.#keepSelection();
	}

	#keepSelection() {
		const s = this.selection;
		if (!s) return;
		const legs = this.doc.spec.legs;
		if (s.kind === 'leg' ? !legs.some((l) => l.id === s.id) : stateIndex(legs, s.id) < 0)
			this.selection = null;
	}

	// ---- undo / redo --------------------------------------------------------------------------

	get canUndo(): boolean {
		void this.#historyRev;
		return this.canEdit && this.#history.canUndo;
	}
	get canRedo(): boolean {
		void this.#historyRev;
		return this.canEdit && this.#history.canRedo;
	}

	undo(): Promise<void> {
		return this.#step(() => this.#history.undo());
	}
	redo(): Promise<void> {
		return this.#step(() => this.#history.redo());
	}

	#step(move: () => SheetDoc | null): Promise<void> {
		return this.#serial(async () => {
			if (!this.canEdit || this.#drag) return;
			const doc = move();
			if (!doc) return;
			this.#historyRev++;
			this.doc = doc;
			this.#autosave?.change(doc);
			try {
				this.view = await this.#compute(doc);
				this.committedView = this.view;
				this.computeError = null;
			} catch (e) {
				this.computeError = messageOf(e, doc.spec.legs);
			}
			this.#keepSelection();
		});
	}

	// ---- dragging on the chart ----------------------------------------------------------------

	#fix(fluid = this.doc.spec.fluid): FixFn | null {
		const e = this.engine;
		if (!e) return null;
		return (inputs: Inputs) => e.fixState(fluid, inputs);
	}

	/** The document with state `key` moved to the pointer, or why it cannot go there. */
	#candidate(drag: Drag, coords: ChartCoords): Candidate | { error: string } {
		const base = drag.base;
		const fix = this.#fix();
		if (drag.kind === 'state' && drag.key === 'start') {
			const next = cloneDoc(base);
			next.spec.start = pairInputs(drag.chart, coords) as Inputs;
			delete next.startSpec;
			return { doc: next, note: null };
		}
		if (!fix) return { error: 'The property engine is still loading; try again in a moment.' };
		const legs = base.spec.legs;
		const states = drag.baseView?.states ?? [];
		let i: number;
		let leg: SheetLegSpec;
		if (drag.kind === 'new-leg') {
			i = legs.length;
			leg = {
				id: drag.key,
				process: this.addProcess,
				target: {},
				...(this.addProcess === 'polytropic' ? { n: this.addN } : {})
			};
		} else {
			i = stateIndex(legs, drag.key) - 1;
			if (i < 0) return { error: 'That state is no longer on the sheet.' };
			leg = legs[i];
		}
		const from = states[i]?.state;
		if (!from) return { error: 'The path has to compute before its states can be moved.' };
		const end = projectOntoLeg(leg.process, from, coords, drag.metric, fix, leg.n, drag.hint);
		if (!end) return { error: `No ${leg.process} state of ${this.fluid.name} lies near there.` };
		drag.hint = end.v;
		const wanted = drag.wanted ?? defaultTargetKind(leg.process, end, drag.chart, leg.n);
		const choice = targetFor(leg.process, end, wanted, drag.chart, leg.n);
		const next = cloneDoc(base);
		const moved: SheetLegSpec = { ...leg, target: choice.target };
		if (drag.kind === 'new-leg') next.spec.legs.push(moved);
		else next.spec.legs[i] = moved;
		return { doc: next, note: choice.note };
	}

	dragStart(e: StateDragEvent, chart: ChartKind, metric: ScreenMetric): void {
		if (!this.canEdit || this.busy) return;
		const legs = this.doc.spec.legs;
		const index = stateIndex(legs, e.stateId);
		const pullNewLeg =
			this.mode === 'add-leg' && index === legs.length && legs.length < MAX_SHEET_LEGS;
		const key = pullNewLeg ? newLegId(legs.map((l) => l.id)) : e.stateId;
		const leg = !pullNewLeg && index > 0 ? legs[index - 1] : null;
		this.#coalescer.cancel();
		this.#dropPendingMove();
		this.preview = null;
		this.#moveSeq = 0;
		this.#drag = {
			kind: pullNewLeg ? 'new-leg' : 'state',
			key,
			chart,
			metric,
			base: this.doc,
			baseView: this.view,
			wanted: leg ? targetOf(leg.target)[0] : null,
			hint: pullNewLeg ? undefined : this.view?.states[index]?.state.v,
			live: null
		};
		this.dragging = true;
		if (!pullNewLeg) this.selection = { kind: 'state', id: e.stateId };
	}

	/**
	 * A pointer move of the drag, paced by frames: the first move after a quiet frame is handled
	 * at once; moves arriving before the next frame wait for it, the latest winning.
	 */
	drag(e: StateDragEvent): void {
		if (!this.#drag) return;
		this.#pendingMove = e;
		if (this.#cancelFrame) return;
		this.#takeMove();
	}

	/** Handle the waiting move and hold any later one until the next frame. */
	#takeMove(): void {
		const move = this.#pendingMove;
		this.#pendingMove = null;
		if (!move) return;
		this.#cancelFrame = nextFrame(() => {
			this.#cancelFrame = null;
			this.#takeMove();
		});
		this.#move(move);
	}

	#dropPendingMove() {
		this.#cancelFrame?.();
		this.#cancelFrame = null;
		this.#pendingMove = null;
	}

	/** One move: the candidate document, its preview drawn now, the server asked (coalesced). */
	#move(e: StateDragEvent): void {
		const d = this.#drag;
		if (!d) return;
		const c = this.#candidate(d, e.coords);
		if ('error' in c) {
			this.#note(c.error, 'caution');
			return;
		}
		c.seq = ++this.#moveSeq;
		this.#preview(d, c);
		this.#coalescer.submit(c);
	}

	/**
	 * The preview of a move, from the engine in the browser (the legs from the moved state on).
	 * Where the engine refuses the move, the last good preview stays and the server's answer speaks.
	 */
	#preview(d: Drag, c: Candidate): void {
		const e = this.engine;
		if (!e || !d.baseView || c.seq === undefined) return;
		const first = stateIndex(c.doc.spec.legs, d.key);
		if (first < 0) return;
		try {
			const p = previewPath(e, c.doc.spec, d.baseView, first, {
				samples: DRAG_SAMPLES,
				budgetMs: PREVIEW_BUDGET_MS
			});
			this.preview = { ...p, seq: c.seq };
		} catch {
			// the server's answer for this move says why (the coalescer's error handler)
		}
	}

	async dragEnd(e: StateDragEvent): Promise<void> {
		const d = this.#drag;
		if (!d) return;
		// the release position is the last move: handled now, not at the next frame
		this.#dropPendingMove();
		this.#move(e);
		this.#coalescer.flush();
		await this.#coalescer.idle();
		this.#drag = null;
		this.dragging = false;
		// only the server's answers become the result: the preview goes with the gesture
		this.preview = null;
		const live = d.live;
		if (!live || sameDoc(live, d.base) || !this.view) {
			this.doc = d.base;
			this.view = d.baseView;
			return;
		}
		const view = this.view;
		await this.#serial(async () => this.#apply(live, view));
		void this.#serial(() => this.#refine());
		if (d.kind === 'new-leg') {
			this.selection = { kind: 'leg', id: d.key };
			this.mode = 'select';
		}
	}

	// ---- chart clicks and keys ----------------------------------------------------------------

	/** Add a leg of the chosen process ending where the chart was clicked. */
	async addLegAt(e: AddPointEvent, chart: ChartKind, metric: ScreenMetric): Promise<Outcome> {
		if (!this.canEdit) return { ok: false, message: 'Your role cannot edit this sheet.' };
		const legs = this.doc.spec.legs;
		if (legs.length >= MAX_SHEET_LEGS)
			return { ok: false, message: `A sheet holds at most ${MAX_SHEET_LEGS} legs.` };
		const fix = this.#fix() ?? (await this.loadEngine(), this.#fix()!);
		const from = this.view?.states[this.view.states.length - 1]?.state;
		if (!from) return { ok: false, message: 'The path has to compute before a leg can be added.' };
		const process = this.addProcess;
		const n = process === 'polytropic' ? this.addN : undefined;
		const end = projectOntoLeg(process, from, e.coords, metric, fix, n);
		if (!end) {
			this.#note(`No ${process} state from the last state lies near there.`, 'caution');
			return { ok: false, message: `No ${process} state lies near there.` };
		}
		const kind = defaultTargetKind(process, end, chart, n);
		const value = valueOf(end, kind);
		const id = newLegId(legs.map((l) => l.id));
		const next = cloneDoc(this.doc);
		next.spec.legs.push({
			id,
			process,
			target: { [value === null ? 'v' : kind]: value ?? end.v },
			...(n !== undefined ? { n } : {})
		});
		const r = await this.commit(next);
		if (r.ok) {
			this.selection = { kind: 'leg', id };
			this.mode = 'select';
		} else this.#note(r.message, 'caution');
		return r;
	}

	/** Arrow keys on a focused state or leg: one small move, one undo step. */
	async nudge(e: NudgeEvent, chart: ChartKind, metric: ScreenMetric): Promise<void> {
		if (!this.canEdit || this.#drag) return;
		const legs = this.doc.spec.legs;
		const index = stateIndex(legs, e.stateId);
		if (index < 0) return;
		if (
			index > 0 &&
			legs[index - 1].process === 'isochoric' &&
			VIEWS[chart].x.prop === 'v' &&
			(e.direction === 'left' || e.direction === 'right')
		) {
			this.#note(
				'The end of an isochoric leg moves only up and down: its v is fixed by the state before it.',
				'info'
			);
			return;
		}
		await this.loadEngine();
		const leg = index > 0 ? legs[index - 1] : null;
		const drag: Drag = {
			kind: 'state',
			key: e.stateId,
			chart,
			metric,
			base: this.doc,
			baseView: this.view,
			wanted: leg ? targetOf(leg.target)[0] : null,
			hint: this.view?.states[index]?.state.v,
			live: null
		};
		const c = this.#candidate(drag, e.coords);
		if ('error' in c) {
			this.#note(c.error, 'caution');
			return;
		}
		const r = await this.commit(c.doc);
		if (!r.ok) this.#note(`Not there: ${r.message}`, 'caution');
		else if (c.note) this.#note(c.note, 'info');
		if (e.reason) this.#note(e.reason, 'caution');
	}

	/** The hover readout's state: the engine in the browser, synchronous. */
	probe(chart: ChartKind, c: ChartCoords): State | null {
		const e = this.engine;
		if (!e) return null;
		try {
			return e.fixState(this.doc.spec.fluid, pairInputs(chart, c) as Inputs, {
				near: this.view?.states[0]?.state
			});
		} catch {
			return null;
		}
	}

	// ---- typed edits (table and setup) --------------------------------------------------------

	/** Commit the next document of an edit (edits.ts); an edit that changes nothing is done. */
	#edit(edit: Edit | SheetDoc): Promise<Outcome> {
		const r: Edit = 'ok' in edit ? edit : { ok: true, doc: edit };
		if (!r.ok) return Promise.resolve(r);
		if (r.doc === this.doc) return Promise.resolve({ ok: true });
		return this.commit(r.doc);
	}

	/** Fix S1 by a typed property (the last two typed fix it). */
	setStartProperty(prop: EditableProp, si: number): Promise<Outcome> {
		return this.#edit(edits.setStartProperty(withoutStartChoice(this.doc), prop, si));
	}

	/**
	 * Fix S1 by a fill level: liquid volume fraction at a temperature or pressure (fill.ts). The
	 * document keeps the fill (shown as such) and the T and v it gives for the engine; typing or
	 * dragging S1 afterwards replaces it with two properties again.
	 */
	async setStartFill(fill: FillSpec): Promise<Outcome> {
		const noFill = edits.setStartFill(this.doc, fill, {});
		if (!noFill.ok) return noFill;
		const e = await this.loadEngine();
		let start: Inputs;
		try {
			start = fillStart(e, this.doc.spec.fluid, fill);
		} catch (err) {
			return {
				ok: false,
				message: `No fill level there: ${messageOf(err, [])} Give a temperature or pressure between the triple point and the critical point.`
			};
		}
		return this.#edit(edits.setStartFill(withoutStartChoice(this.doc), fill, start));
	}

	/** A temperature typed in a P cell (or a pressure in a T cell): the saturation value there, with a note (saturation-input.ts). */
	async readAcrossSaturation(column: 'T' | 'P', typed: string): Promise<SaturationReading> {
		const e = await this.loadEngine();
		return readAcrossSaturation(e, this.doc.spec.fluid, column, typed, this.doc.units);
	}

	/** Replace the start pair at once (the table's "fixed by" picker). */
	setStartPair(a: EditableProp, b: EditableProp): Promise<Outcome> {
		return this.#edit(
			edits.setStartPair(withoutStartChoice(this.doc), this.view?.states[0]?.state, a, b)
		);
	}

	/**
	 * End leg `index` where its process first meets the saturation line (saturation-target.ts):
	 * target x = 0 or 1, the leg marked `to: 'saturation'`. The outcome says which line.
	 */
	async setTargetSaturation(index: number): Promise<Outcome & { line?: 'liquid' | 'vapor' }> {
		const leg = this.doc.spec.legs[index];
		const start = this.view?.states[index]?.state;
		if (!leg || !start) return { ok: false, message: 'That leg is no longer on the sheet.' };
		const e = await this.loadEngine();
		const r = saturationTarget(e, this.doc.spec.fluid, start, leg.process, leg.n);
		if (!r.ok) return { ok: false, message: r.message };
		const out = await this.#edit(edits.setTargetSaturation(this.doc, index, r.x));
		return out.ok ? { ok: true, line: r.x === 0 ? 'liquid' : 'vapor' } : out;
	}

	/** End leg `index` exactly on a typed property of its end state. */
	setTarget(index: number, prop: EditableProp, si: number): Promise<Outcome> {
		return this.#edit(edits.setTarget(this.doc, index, prop, si));
	}

	/** Change a leg's process, keeping its id (so its review notes stay on it) and, where it can, its end. */
	setProcess(index: number, process: Process): Promise<Outcome> {
		const end = this.view?.states[index + 1]?.state;
		return this.#edit(edits.setProcess(this.doc, index, process, end, this.addN));
	}

	setN(index: number, n: number): Promise<Outcome> {
		return this.#edit(edits.setN(this.doc, index, n));
	}

	deleteLeg(index: number): Promise<Outcome> {
		return this.#edit(edits.deleteLeg(this.doc, index)).then((r) => {
			if (r.ok) this.selection = null;
			return r;
		});
	}

	/** Move a leg one place earlier (-1) or later (+1); every state after it re-solves. */
	moveLeg(index: number, by: -1 | 1): Promise<Outcome> {
		return this.#edit(edits.moveLeg(this.doc, index, by));
	}

	/** Delete the selected leg (the Delete key); a selected state deletes the leg ending there. */
	deleteSelected(): Promise<Outcome> {
		const s = this.selection;
		if (!s) return Promise.resolve({ ok: false, message: 'Select a leg first.' });
		const legs = this.doc.spec.legs;
		const index =
			s.kind === 'leg' ? legs.findIndex((l) => l.id === s.id) : stateIndex(legs, s.id) - 1;
		if (index < 0)
			return Promise.resolve({
				ok: false,
				message: 'The first state cannot be deleted; change it instead.'
			});
		return this.deleteLeg(index);
	}

	setSystem(system: SheetDoc['spec']['system']): Promise<Outcome> {
		return this.#edit(edits.setSystem(this.doc, system));
	}

	/** Water's formulation for this sheet's states and legs' Q and W: IAPWS-95 or IAPWS-IF97. */
	setFormulation(formulation: Formulation): Promise<Outcome> {
		return this.#edit(edits.setFormulation(this.doc, formulation));
	}

	/**
	 * The sheet's window: every state is solved within these bounds (K, Pa absolute; null for an
	 * open side, all null for the formulation's whole range).
	 */
	setWindow(
		window: Partial<Record<'Tmin' | 'Tmax' | 'Pmin' | 'Pmax', number | null>>
	): Promise<Outcome> {
		const r = withWindow(this.doc, window);
		if (!r.ok) return Promise.resolve(r);
		return this.commit(r.doc);
	}

	/** Pick one of the states S1's pair meets (startChoice): it is kept as the start's choice. */
	pickStart(index: number): Promise<Outcome> {
		const choice = this.startChoice;
		const c = choice?.candidates[index];
		if (!choice || !c) return Promise.resolve({ ok: false, message: 'There is nothing to pick.' });
		return this.commit(withStartChoice(choice.doc, c));
	}

	/** Close the candidate picker without picking (the sheet stays as it was). */
	dismissStartChoice(): void {
		this.startChoice = null;
	}

	setLimits(limits: NonNullable<SheetDoc['spec']['limits']>): Promise<Outcome> {
		return this.#edit(edits.setLimits(this.doc, limits));
	}

	/** A view preference: saved for editors, for readers it changes the view only. */
	#viewOnly(next: SheetDoc): Promise<Outcome> {
		if (this.canEdit) return this.#edit(next);
		this.doc = next;
		return Promise.resolve({ ok: true });
	}

	setUnits(patch: Partial<UnitPrefs>): Promise<Outcome> {
		return this.#viewOnly(edits.setUnits(this.doc, patch));
	}

	/** Chart preferences; for readers they change the view only (nothing is saved). */
	setChart(patch: Partial<ChartPrefs>): Promise<Outcome> {
		return this.#viewOnly(edits.setChart(this.doc, patch));
	}

	setTitleBlock(patch: Partial<TitleBlockFields>): Promise<Outcome> {
		return this.#edit(edits.setTitleBlock(this.doc, patch));
	}

	setDescription(text: string): Promise<Outcome> {
		return this.#edit(edits.setDescription(this.doc, text));
	}

	/** Another fluid: the same spec in it, if its start state exists there. */
	async setFluid(id: string): Promise<Outcome> {
		const info = this.fluids.find((f) => f.id === id);
		if (!info) return { ok: false, message: 'Unknown fluid.' };
		if (id === this.doc.spec.fluid) return { ok: true };
		let start: Inputs | undefined;
		if (this.doc.startSpec) {
			// the same fill level in the other fluid
			try {
				start = fillStart(await this.loadEngine(), id, this.doc.startSpec);
			} catch (err) {
				return {
					ok: false,
					message: `The fill level cannot be kept for ${info.name}: ${messageOf(err, [])} Change the start state first.`
				};
			}
		}
		let sat: SaturationCurve;
		try {
			sat = await getSaturation(id);
		} catch (e) {
			return { ok: false, message: messageOf(e, []) };
		}
		const r = await this.commit(edits.setFluid(this.doc, id, start));
		if (r.ok) {
			this.fluid = info;
			this.saturation = sat;
		} else
			return {
				ok: false,
				message: `The path cannot be computed for ${info.name}: ${r.message} Change the start state or the targets first.`
			};
		return r;
	}

	// ---- conflicts and recovery ---------------------------------------------------------------

	/** Fetch the draft someone else saved (to compare, or to load it). */
	async fetchTheirs(): Promise<Outcome> {
		try {
			const s = await getSheetDraft(this.team, this.sheetId);
			this.theirs = {
				doc: s.doc,
				version: s.version,
				updatedAt: s.updatedAt,
				updatedBy: s.updatedBy
			};
			return { ok: true };
		} catch (e) {
			return { ok: false, message: messageOf(e, []) };
		}
	}

	/** Drop these edits and continue from the server's draft. */
	async loadTheirs(): Promise<Outcome> {
		const r = this.theirs ? { ok: true as const } : await this.fetchTheirs();
		if (!r.ok || !this.theirs) return r;
		const t = this.theirs;
		this.#autosave?.adopt(t.version, t.updatedAt);
		this.#history.reset(t.doc);
		this.#historyRev++;
		this.doc = t.doc;
		this.updatedAt = t.updatedAt;
		this.updatedBy = t.updatedBy;
		this.theirs = null;
		this.recovery = null;
		try {
			this.view = await this.#compute(t.doc);
			this.committedView = this.view;
			this.computeError = null;
		} catch (e) {
			this.computeError = messageOf(e, t.doc.spec.legs);
		}
		this.#keepSelection();
		this.notice = { kind: 'info', text: `Loaded the draft ${t.updatedBy} saved.` };
		return { ok: true };
	}

	/** Keep these edits: save them over the draft the server now holds. */
	keepMine(): void {
		const c = this.save.conflict;
		if (!c) return;
		this.theirs = null;
		this.#autosave?.overwrite(c.version);
	}

	/** Use the local copy a previous visit left behind (based on an older version). */
	async useRecovery(): Promise<Outcome> {
		const rec = this.recovery;
		if (!rec) return { ok: true };
		const r = await this.commit(rec.doc);
		if (r.ok) {
			this.recovery = null;
			this.notice = {
				kind: 'info',
				text: 'Restored the copy from this browser; it replaces the saved draft.'
			};
		}
		return r;
	}

	discardRecovery(storage: KeyValueStore | null): void {
		this.recovery = null;
		storage?.removeItem(`sw:draft:${this.sheetId}`);
	}

	// ---- background lines ---------------------------------------------------------------------

	/**
	 * Fetch the fluid's chart data (the dome and the fluid list): an immutable, versioned resource
	 * the browser keeps, so the page's HTML carries only the sheet. Without it the charts draw no dome.
	 */
	async loadChartData(f: typeof fetch = fetch): Promise<void> {
		const ref = this.#chartData;
		let data: ChartData;
		try {
			data = await apiCall<ChartData>(f, ref.url);
		} catch (e) {
			this.notice = {
				kind: 'caution',
				text: `The vapor dome could not be loaded (${messageOf(e, [])}), so the charts are drawn without it. Reload the page to try again.`
			};
			return;
		}
		if (data.fluids.length) this.fluids = data.fluids;
		if (this.doc.spec.fluid !== ref.fluid || this.saturation) return;
		this.saturation = data.saturation;
		if (!data.saturation)
			this.notice = {
				kind: 'caution',
				text: `The engine could not trace the vapor dome of ${this.fluid.name} just now, so the charts are drawn without it. The states and legs are computed as usual.`
			};
	}

	/**
	 * Fetch the first paint's leg points (the page carries the path without them) and draw the
	 * legs, unless an edit has drawn a path of its own since. If they cannot be had (the draft
	 * changed meanwhile, offline), the path is computed again as an edit would.
	 */
	async loadPoints(f: typeof fetch = fetch): Promise<void> {
		const pending = this.#points;
		if (!pending) return;
		this.#points = null;
		let view: PathView | null = null;
		try {
			const got = await apiCall<LegPoints>(f, pending.ref.url);
			const result = withLegPoints(pending.view.result, got);
			if (result) view = viewOf(this.doc.spec, result);
		} catch {
			// computed again below
		}
		if (this.view !== pending.view || this.#drag) return;
		if (!view) {
			try {
				view = await this.#compute(this.doc);
			} catch (e) {
				this.#note(
					`The path’s legs could not be drawn: ${messageOf(e, this.doc.spec.legs)}`,
					'caution'
				);
				return;
			}
			if (this.view !== pending.view || this.#drag) return;
		}
		this.view = view;
		if (this.committedView === pending.view) this.committedView = view;
	}

	/** Fetch the isolines and limit curves the current fluid, units and path need (frame.ts; cached by values). */
	async refreshLines(): Promise<void> {
		const f = this.fluid;
		if (!f) return;
		const want = frameLines(
			f,
			this.doc,
			(this.committedView?.states ?? []).map((s) => s.state),
			this.dome
		);
		// water by IAPWS-IF97: its background lines too
		const by = f.id === 'water' && this.doc.spec.formulation === 'if97' ? 'if97' : undefined;
		const key = JSON.stringify([f.id, by, want.lines]);
		if (key !== this.#isoKey) {
			this.#isoKey = key;
			try {
				const got = await Promise.all(
					want.lines.map(
						async ([kind, values]) =>
							[kind, await getIsolines(f.id, kind, values, fetch, by)] as const
					)
				);
				if (this.#isoKey === key) this.isolines = Object.fromEntries(got);
			} catch {
				this.#isoKey = '';
			}
		}
		const lkey = JSON.stringify([f.id, by, want.limitIsobars, want.limitIsotherms]);
		if (lkey !== this.#limitKey) {
			this.#limitKey = lkey;
			try {
				const [isobars, isotherms] = await Promise.all([
					getIsolines(f.id, 'isobar', want.limitIsobars, fetch, by),
					getIsolines(f.id, 'isotherm', want.limitIsotherms, fetch, by)
				]);
				if (this.#limitKey === lkey) this.limitCurves = { isobars, isotherms };
			} catch {
				this.#limitKey = '';
			}
		}
	}

	/** Design limits for the chart, with the curves a limit needs on the other diagram. */
	chartLimits(): ChartLimits {
		return frameLimits(this.doc.spec.limits, this.limitCurves);
	}

	/** How the chart of `kind` maps data to screen (for projecting the pointer onto a leg). */
	metric(kind: ChartKind, width: number, height: number): ScreenMetric {
		const v = this.committedView;
		const d = fitDomain(kind, this.doc.chart.pressureScale, {
			saturation: this.dome,
			triple: this.fluid.triple,
			states: v?.states ?? [],
			legs: v?.legs ?? [],
			limits: this.chartLimits()
		});
		return {
			kind,
			pressureScale: this.doc.chart.pressureScale,
			ySpan: d.y,
			vSpan: d.x,
			aspect: Math.max(0.3, (width - 84) / Math.max(60, height - 90))
		};
	}

	/** Anchor key of the state at a position (for the table and notes). */
	stateKeyAt(index: number): string {
		return stateKey(this.doc.spec.legs, index);
	}
}
