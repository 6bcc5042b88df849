/**
 * The memo figure: the chart's drawing SVG(s) with a title block and the brief's caution line,
 * as one self-contained SVG (fonts embedded as @font-face data URLs, colours of the paper theme
 * set on the root so the figure looks the same in any viewer, in a dark page or in print).
 * Pure string work: the browser part (serialising the live chart, loading fonts, PNG) is in
 * `browser.ts`.
 */

export interface MemoPerson {
	name: string | null;
	/** Unix ms */
	at: number | null;
}

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
	fonts: MemoFont[];
}

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
	'--sw-caution': '#a3361b',
	'--sw-caution-wash': '#f6e1d6',
	'--sw-dome': 'rgb(51 70 184 / 0.06)'
};

const SANS = `'IBM Plex Sans', system-ui, sans-serif`;
const MONO = `'JetBrains Mono', ui-monospace, monospace`;

export function escapeXml(s: string): string {
	return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!);
}

/** ISO date (UTC) of a Unix ms time, as engineering documents date things. */
export function isoDate(ms: number | null): string {
	return ms === null ? '' : new Date(ms).toISOString().slice(0, 10);
}

/** @font-face rules for embedded fonts. */
export function fontFaceCss(fonts: readonly MemoFont[]): string {
	return fonts
		.map((f) => `@font-face{font-family:'${f.family}';font-style:${f.style};font-weight:${f.weight};font-display:block;src:url(${f.dataUrl}) format('woff2');}`)
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

/** Composes the memo figure. */
export function composeMemoFigure(input: MemoInput): MemoFigure {
	const { drawings, title } = input;
	const drawingsWidth = drawings.reduce((s, d) => s + d.width, 0) + GAP * Math.max(0, drawings.length - 1);
	const width = Math.round(Math.max(MIN_WIDTH, drawingsWidth + 2 * MARGIN));
	const inner = width - 2 * MARGIN;
	const drawingsHeight = drawings.reduce((m, d) => Math.max(m, d.height), 0);

	const parts: string[] = [];
	let x = MARGIN + (inner - drawingsWidth) / 2;
	for (const d of drawings) {
		parts.push(`<g class="swm-drawing" transform="translate(${x.toFixed(1)},${MARGIN})">${d.svg}</g>`);
		x += d.width + GAP;
	}

	const rows: { h: number; cells: Cell[] }[] = [
		{
			h: 46,
			cells: [
				{ label: title.team ? `Sheet · ${title.team}` : 'Sheet', value: title.sheet, w: 0.5, big: true },
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
				{ label: 'Designed', value: person(title.designer), w: 1 / 3 },
				{ label: 'Checked', value: person(title.checker), w: 1 / 3 },
				{ label: 'Approved', value: person(title.approver), w: 1 / 3 }
			]
		}
	];

	let y = MARGIN + drawingsHeight + 14;
	const blockTop = y;
	const block: string[] = [];
	for (const row of rows) {
		let cx = MARGIN;
		for (const [i, c] of row.cells.entries()) {
			const cw = i === row.cells.length - 1 ? MARGIN + inner - cx : Math.round(inner * c.w);
			const size = c.big ? 15 : 11.5;
			block.push(
				`<g class="swm-cell" transform="translate(${cx},${y})">` +
					(i > 0 ? `<line x1="0" y1="0" x2="0" y2="${row.h}" class="swm-rule"/>` : '') +
					`<text x="8" y="12" class="swm-label">${escapeXml(c.label.toUpperCase())}</text>` +
					`<text x="8" y="${row.h - 9}" class="swm-value${c.mono ? ' swm-mono' : ''}${c.big ? ' swm-big' : ''}">${escapeXml(fitText(c.value, cw - 16, c.mono ? size * 1.12 : size))}</text>` +
					`</g>`
			);
			cx += cw;
		}
		y += row.h;
		block.push(`<line x1="${MARGIN}" y1="${y}" x2="${MARGIN + inner}" y2="${y}" class="swm-rule"/>`);
	}
	block.pop();
	const blockHeight = y - blockTop;
	const frame = `<rect x="${MARGIN}" y="${blockTop}" width="${inner}" height="${blockHeight}" class="swm-frame"/>`;

	y += 16;
	const cautionLines = wrapText(input.caution, inner, 10);
	const caution = cautionLines.map((l, i) => `<tspan x="${MARGIN}" y="${y + i * 13}">${escapeXml(l)}</tspan>`).join('');
	const height = Math.round(y + (cautionLines.length - 1) * 13 + MARGIN);

	const vars = Object.entries(PAPER_THEME)
		.map(([k, v]) => `${k}:${v}`)
		.join(';');
	const fontCss = fontFaceCss(input.fonts);
	const css = `${fontCss}
.swm-root{font-family:${SANS};}
.swm-plate{fill:${PAPER_THEME['--sw-sheet']};}
.swm-frame{fill:none;stroke:${PAPER_THEME['--sw-ink']};stroke-width:1.25;}
.swm-rule{stroke:${PAPER_THEME['--sw-ink']};stroke-width:0.6;}
.swm-label{font-family:${SANS};font-size:7.5px;font-weight:600;letter-spacing:0.1em;fill:${PAPER_THEME['--sw-ink-soft']};}
.swm-value{font-family:${SANS};font-size:11.5px;fill:${PAPER_THEME['--sw-ink']};}
.swm-value.swm-mono{font-family:${MONO};font-size:10.5px;}
.swm-value.swm-big{font-size:15px;font-weight:600;}
.swm-caution{font-family:${SANS};font-size:10px;font-style:italic;fill:${PAPER_THEME['--sw-caution']};}`;

	const summary = `${title.sheet} — ${title.revision}, ${title.status}; ${title.fluid}`;
	const svg =
		`<svg xmlns="http://www.w3.org/2000/svg" class="swm-root" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" style="${vars}" role="img" aria-label="${escapeXml(summary)}">` +
		`<title>${escapeXml(summary)}</title>` +
		`<style>${css}</style>` +
		`<rect class="swm-plate" x="0" y="0" width="${width}" height="${height}"/>` +
		parts.join('') +
		`<g class="swm-title-block">${frame}${block.join('')}</g>` +
		`<text class="swm-caution">${caution}</text>` +
		`</svg>`;
	return { svg, width, height, fontCss };
}
