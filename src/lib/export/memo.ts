/**
 * The memo figure: the chart's drawing SVG(s) with a title block and the brief's caution line,
 * as one self-contained SVG (fonts embedded as @font-face data URLs, colours of the paper theme
 * set on the root so the figure looks the same in any viewer, in a dark page or in print).
 * Pure string work: the browser part (serialising the live chart, loading fonts, PNG) is in
 * `browser.ts`.
 */
import { isoDate, SIGNED_LABEL, type SignOffPerson } from '$lib/revisions/sign-off';

export type MemoPerson = SignOffPerson;

/** What the title block says. Free text is escaped; long values are shortened with an ellipsis. */
export interface MemoTitle {
	sheet: string;
	team?: string;
	/** "Rev 2", or "Working draft (based on Rev 1)" */
	revision: string;
	/** "Approved", "In check", … */
	status: string;
	/** "Water (H₂O)" */
	fluid: string;
	/** "IAPWS-95 — Wagner & Pruß (2002)" */
	formulation: string;
	/** "Closed system, 0.5 m³" */
	system: string;
	/** "SI: °C, kPa g (atmosphere 101.33 kPa a), m³/kg, kJ/kg" */
	units: string;
	designer: MemoPerson;
	checker: MemoPerson;
	approver: MemoPerson;
	project?: string;
	equipment?: string;
	tag?: string;
	documentNumber?: string;
	site?: string;
	/** sign-off steps taken over open review notes, in words (shown with the findings) */
	overrides?: string[];
	/** when the figure was made, Unix ms */
	issued: number;
	/** what that date is called: "Issued" for a revision, "Date" for the working draft (which is not issued) */
	dateLabel?: string;
}

export interface MemoDrawing {
	/** a serialised <svg> of the chart drawing, with width and height attributes */
	svg: string;
	width: number;
	height: number;
}

export interface MemoFont {
	family: string;
	weight: number;
	style: 'normal' | 'italic';
	/** data:font/woff2;base64,… */
	dataUrl: string;
}

export interface MemoInput {
	drawings: MemoDrawing[];
	title: MemoTitle;
	/** the caution line(s) of the brief */
	caution: string;
	/** the findings above the caution (warnings, the cycle's results), one paragraph each */
	findings?: string[];
	fonts: MemoFont[];
	/**
	 * 'wide' (default): the drawings side by side at their on-screen size. 'column': the drawings
	 * stacked in a figure MEMO_COLUMN.widthPx wide, for one column of a memo (see MEMO_COLUMN).
	 */
	layout?: 'wide' | 'column';
}

/**
 * The memo-column figure: 85 mm wide (a common one-column width of A4 reports and journals —
 * common practice) at 300 dpi is 1004 px. The figure is laid out 320 CSS px wide and rendered at
 * 1004 / 320 = 3.1375 pixels per CSS px, so 1 CSS px prints as 85/320 mm and the smallest text
 * (minFontPx, 9.5 px) as 9.5 × 85/320 mm = 7.15 pt (1 pt = 25.4/72 mm).
 */
export const MEMO_COLUMN = {
	widthPx: 320,
	widthMm: 85,
	dpi: 300,
	outputPx: 1004,
	minFontPx: 9.5
} as const;
export const MEMO_COLUMN_PIXEL_RATIO = MEMO_COLUMN.outputPx / MEMO_COLUMN.widthPx;

/** The printed size in points of `px` CSS px of a column figure placed at its column width. */
export function columnPoints(px: number): number {
	return (px * (MEMO_COLUMN.widthMm / MEMO_COLUMN.widthPx)) / (25.4 / 72);
}

/**
 * Chart text the column figure sets larger than the chart draws it on screen: every class of the
 * chart's style sheet (src/lib/charts/style.ts) below MEMO_COLUMN.minFontPx, and the inline size
 * the chart gives long state labels.
 */
export const COLUMN_CHART_CSS = `.swm-column .swc-drawing .swc-state-text{font-size:${MEMO_COLUMN.minFontPx}px;}`;

export interface MemoFigure {
	svg: string;
	width: number;
	height: number;
	/** the @font-face rules embedded in the SVG (html-to-image takes them as they are) */
	fontCss: string;
}

/** The paper theme (src/app.css :root), fixed for memo figures. */
export const PAPER_THEME: Readonly<Record<string, string>> = {
	'--sw-paper': '#f4efe4',
	'--sw-sheet': '#fbf8f1',
	'--sw-well': '#ece5d6',
	'--sw-ink': '#2a2825',
	'--sw-ink-soft': '#5e5951',
	'--sw-ink-faint': '#a59d8e',
	'--sw-rule': '#d6ccb8',
	'--sw-accent': '#3346b8',
	'--sw-accent-wash': '#e3e6f7',
	'--sw-accent-ink': '#ffffff',
	'--sw-caution': '#a3361b',
	'--sw-caution-wash': '#f6e1d6',
	'--sw-dome': 'rgb(51 70 184 / 0.06)'
};

const SANS = `'IBM Plex Sans', system-ui, sans-serif`;
const MONO = `'JetBrains Mono', ui-monospace, monospace`;

export function escapeXml(s: string): string {
	return s.replace(
		/[&<>"']/g,
		(c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!
	);
}

/** ISO date (UTC) of a Unix ms time, as engineering documents date things. */
export { isoDate };

/** @font-face rules for embedded fonts. */
export function fontFaceCss(fonts: readonly MemoFont[]): string {
	return fonts
		.map(
			(f) =>
				`@font-face{font-family:'${f.family}';font-style:${f.style};font-weight:${f.weight};font-display:block;src:url(${f.dataUrl}) format('woff2');}`
		)
		.join('\n');
}

// average advance of IBM Plex Sans, in em (measured on mixed text); used only to shorten and wrap
const AVG_EM = 0.54;

/** Shortens text to fit `width` px at `size` px, with an ellipsis. */
export function fitText(text: string, width: number, size: number): string {
	const max = Math.max(1, Math.floor(width / (size * AVG_EM)));
	return text.length <= max ? text : `${text.slice(0, Math.max(1, max - 1)).trimEnd()}…`;
}

/** Greedy word wrap to lines of at most `width` px at `size` px. */
export function wrapText(text: string, width: number, size: number): string[] {
	const max = Math.max(8, Math.floor(width / (size * AVG_EM)));
	const lines: string[] = [];
	let line = '';
	for (const word of text.split(/\s+/).filter(Boolean)) {
		if (line && (line + ' ' + word).length > max) {
			lines.push(line);
			line = word;
		} else line = line ? `${line} ${word}` : word;
	}
	if (line) lines.push(line);
	return lines;
}

interface Cell {
	label: string;
	value: string;
	/** share of the row's width */
	w: number;
	mono?: boolean;
	big?: boolean;
}

const MARGIN = 16;
const GAP = 12;
const MIN_WIDTH = 720;

function person(p: MemoPerson): string {
	if (!p.name) return '—';
	return p.at ? `${p.name} · ${isoDate(p.at)}` : p.name;
}

/** Text sizes (px) and spacing of a layout. */
interface LayoutStyle {
	margin: number;
	label: number;
	value: number;
	mono: number;
	big: number;
	note: number;
	noteLine: number;
	/** label baseline from the row's top, value baseline from its bottom */
	labelY: number;
	valueInset: number;
}

const WIDE: LayoutStyle = {
	margin: MARGIN,
	label: 7.5,
	value: 11.5,
	mono: 10.5,
	big: 15,
	note: 10,
	noteLine: 13,
	labelY: 12,
	valueInset: 9
};
const COLUMN: LayoutStyle = {
	margin: 8,
	label: MEMO_COLUMN.minFontPx,
	value: 10.5,
	mono: 10,
	big: 12.5,
	note: MEMO_COLUMN.minFontPx,
	noteLine: 12.5,
	labelY: 12,
	valueInset: 7
};

function wideRows(title: MemoTitle): { h: number; cells: Cell[] }[] {
	return [
		{
			h: 46,
			cells: [
				{
					label: title.team ? `Sheet · ${title.team}` : 'Sheet',
					value: title.sheet,
					w: 0.5,
					big: true
				},
				{ label: 'Revision', value: title.revision, w: 0.2 },
				{ label: 'Status', value: title.status, w: 0.12 },
				{ label: 'Document no.', value: title.documentNumber || '—', w: 0.18, mono: true }
			]
		},
		{
			h: 36,
			cells: [
				{ label: 'Project', value: title.project || '—', w: 0.3 },
				{ label: 'Equipment', value: title.equipment || '—', w: 0.3 },
				{ label: 'Tag', value: title.tag || '—', w: 0.14, mono: true },
				{ label: 'Site', value: title.site || '—', w: 0.26 }
			]
		},
		{
			h: 36,
			cells: [
				{ label: 'Fluid', value: title.fluid, w: 0.2 },
				{ label: 'Formulation', value: title.formulation, w: 0.38 },
				{ label: 'System', value: title.system, w: 0.24 },
				{ label: title.dateLabel ?? 'Issued', value: isoDate(title.issued), w: 0.18, mono: true }
			]
		},
		{ h: 36, cells: [{ label: 'Units', value: title.units, w: 1, mono: true }] },
		{
			h: 36,
			cells: [
				{ label: SIGNED_LABEL.designer, value: person(title.designer), w: 1 / 3 },
				{ label: SIGNED_LABEL.checker, value: person(title.checker), w: 1 / 3 },
				{ label: SIGNED_LABEL.approver, value: person(title.approver), w: 1 / 3 }
			]
		}
	];
}

/**
 * The title block for a column: one full-width field a row, its value wrapped rather than cut, so
 * the text keeps its size; fields that say nothing are left out.
 */
function columnFields(
	title: MemoTitle
): { label: string; value: string; mono?: boolean; big?: boolean }[] {
	const join = (parts: Array<string | undefined>, sep = ' · ') =>
		parts.filter((p) => p && p !== '—').join(sep);
	const signed = (what: string, p: MemoPerson) => (p.name ? `${what} ${person(p)}` : '');
	const equipment = join([title.tag, title.equipment, title.project, title.site]);
	const signOff = join(
		[
			signed(SIGNED_LABEL.designer, title.designer),
			signed(SIGNED_LABEL.checker.toLowerCase(), title.checker),
			signed(SIGNED_LABEL.approver.toLowerCase(), title.approver)
		],
		'; '
	);
	return [
		{ label: title.team ? `Sheet · ${title.team}` : 'Sheet', value: title.sheet, big: true },
		{
			label: 'Revision',
			value: join([
				title.revision,
				title.status,
				title.documentNumber,
				`issued ${isoDate(title.issued)}`
			])
		},
		...(equipment ? [{ label: 'Equipment', value: equipment }] : []),
		{ label: 'Fluid and system', value: `${title.fluid}, ${title.formulation}; ${title.system}` },
		{ label: 'Sign-off', value: signOff || 'Not signed' },
		{ label: 'Units', value: title.units, mono: true }
	];
}

/** Composes the memo figure. */
export function composeMemoFigure(input: MemoInput): MemoFigure {
	const { drawings, title } = input;
	const column = input.layout === 'column';
	const L = column ? COLUMN : WIDE;
	const M = L.margin;
	const parts: string[] = [];
	let width: number;
	let drawingsBottom: number;
	if (column) {
		// stacked, each centred; a drawing wider than the column is scaled down to fit
		width = MEMO_COLUMN.widthPx;
		const inner = width - 2 * M;
		let y = M;
		for (const d of drawings) {
			const k = Math.min(1, inner / d.width);
			const x = M + (inner - d.width * k) / 2;
			parts.push(
				`<g class="swm-drawing" transform="translate(${x.toFixed(1)},${y.toFixed(1)})${k < 1 ? ` scale(${k.toFixed(4)})` : ''}">${d.svg}</g>`
			);
			y += d.height * k + GAP;
		}
		drawingsBottom = drawings.length ? y - GAP : M;
	} else {
		const drawingsWidth =
			drawings.reduce((s, d) => s + d.width, 0) + GAP * Math.max(0, drawings.length - 1);
		width = Math.round(Math.max(MIN_WIDTH, drawingsWidth + 2 * M));
		let x = M + (width - 2 * M - drawingsWidth) / 2;
		for (const d of drawings) {
			parts.push(`<g class="swm-drawing" transform="translate(${x.toFixed(1)},${M})">${d.svg}</g>`);
			x += d.width + GAP;
		}
		drawingsBottom = M + drawings.reduce((m, d) => Math.max(m, d.height), 0);
	}
	const inner = width - 2 * M;
	let y = drawingsBottom + 14;
	const blockTop = y;
	const block: string[] = [];
	if (column) {
		for (const f of columnFields(title)) {
			const size = f.big ? L.big : f.mono ? L.mono * 1.12 : L.value;
			const line = Math.max(L.noteLine, size * 1.2);
			const lines = wrapText(f.value, inner - 12, size);
			block.push(
				`<g class="swm-cell" transform="translate(${M},${y})">` +
					`<text x="6" y="${L.labelY}" class="swm-label">${escapeXml(fitText(f.label.toUpperCase(), inner - 12, L.label * 1.25))}</text>` +
					`<text class="swm-value${f.mono ? ' swm-mono' : ''}${f.big ? ' swm-big' : ''}">${lines.map((l, i) => `<tspan x="6" y="${(L.labelY + (i + 1) * line).toFixed(1)}">${escapeXml(l)}</tspan>`).join('')}</text>` +
					`</g>`
			);
			y += L.labelY + lines.length * line + 6;
			block.push(`<line x1="${M}" y1="${y}" x2="${M + inner}" y2="${y}" class="swm-rule"/>`);
		}
		block.pop();
	} else {
		for (const row of wideRows(title)) {
			let cx = M;
			for (const [i, c] of row.cells.entries()) {
				const cw = i === row.cells.length - 1 ? M + inner - cx : Math.round(inner * c.w);
				const size = c.big ? L.big : L.value;
				block.push(
					`<g class="swm-cell" transform="translate(${cx},${y})">` +
						(i > 0 ? `<line x1="0" y1="0" x2="0" y2="${row.h}" class="swm-rule"/>` : '') +
						`<text x="8" y="${L.labelY}" class="swm-label">${escapeXml(c.label.toUpperCase())}</text>` +
						`<text x="8" y="${row.h - L.valueInset}" class="swm-value${c.mono ? ' swm-mono' : ''}${c.big ? ' swm-big' : ''}">${escapeXml(fitText(c.value, cw - 16, c.mono ? size * 1.12 : size))}</text>` +
						`</g>`
				);
				cx += cw;
			}
			y += row.h;
			block.push(`<line x1="${M}" y1="${y}" x2="${M + inner}" y2="${y}" class="swm-rule"/>`);
		}
		block.pop();
	}
	const blockHeight = y - blockTop;
	const frame = `<rect x="${M}" y="${blockTop}" width="${inner}" height="${blockHeight}" class="swm-frame"/>`;

	// the findings (ink), then the caution (caution colour), each paragraph wrapped
	y += 16;
	const notes: string[] = [];
	for (const para of [...(title.overrides ?? []), ...(input.findings ?? [])]) {
		const lines = wrapText(para, inner, L.note);
		notes.push(
			`<text class="swm-finding">${lines.map((l, i) => `<tspan x="${M}" y="${y + i * L.noteLine}">${escapeXml(l)}</tspan>`).join('')}</text>`
		);
		y += lines.length * L.noteLine + 4;
	}
	const cautionLines = wrapText(input.caution, inner, L.note);
	const caution = cautionLines
		.map((l, i) => `<tspan x="${M}" y="${y + i * L.noteLine}">${escapeXml(l)}</tspan>`)
		.join('');
	const height = Math.round(y + (cautionLines.length - 1) * L.noteLine + M);

	const vars = Object.entries(PAPER_THEME)
		.map(([k, v]) => `${k}:${v}`)
		.join(';');
	const fontCss = fontFaceCss(input.fonts);
	const css = `${fontCss}
.swm-root{font-family:${SANS};}
.swm-plate{fill:${PAPER_THEME['--sw-sheet']};}
.swm-frame{fill:none;stroke:${PAPER_THEME['--sw-ink']};stroke-width:1.25;}
.swm-rule{stroke:${PAPER_THEME['--sw-ink']};stroke-width:0.6;}
.swm-label{font-family:${SANS};font-size:${L.label}px;font-weight:600;letter-spacing:0.1em;fill:${PAPER_THEME['--sw-ink-soft']};}
.swm-value{font-family:${SANS};font-size:${L.value}px;fill:${PAPER_THEME['--sw-ink']};}
.swm-value.swm-mono{font-family:${MONO};font-size:${L.mono}px;}
.swm-value.swm-big{font-size:${L.big}px;font-weight:600;}
.swm-finding{font-family:${SANS};font-size:${L.note}px;fill:${PAPER_THEME['--sw-ink']};}
.swm-caution{font-family:${SANS};font-size:${L.note}px;font-style:italic;fill:${PAPER_THEME['--sw-caution']};}${column ? `\n${COLUMN_CHART_CSS}` : ''}`;

	const summary = `${title.sheet} — ${title.revision}, ${title.status}; ${title.fluid}`;
	const svg =
		`<svg xmlns="http://www.w3.org/2000/svg" class="swm-root${column ? ' swm-column' : ''}" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" style="${vars}" role="img" aria-label="${escapeXml(summary)}">` +
		`<title>${escapeXml(summary)}</title>` +
		`<style>${css}</style>` +
		`<rect class="swm-plate" x="0" y="0" width="${width}" height="${height}"/>` +
		parts.join('') +
		`<g class="swm-title-block">${frame}${block.join('')}</g>` +
		notes.join('') +
		`<text class="swm-caution">${caution}</text>` +
		`</svg>`;
	return { svg, width, height, fontCss };
}
