import { toBlob } from 'html-to-image';
import plex400 from '@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff2?url';
import plex400i from '@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-italic.woff2?url';
import plex600 from '@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff2?url';
import mono400 from '@fontsource/jetbrains-mono/files/jetbrains-mono-latin-400-normal.woff2?url';
import mono600 from '@fontsource/jetbrains-mono/files/jetbrains-mono-latin-600-normal.woff2?url';
import {
	composeMemoFigure,
	MEMO_COLUMN,
	PAPER_THEME,
	type MemoDrawing,
	type MemoFigure,
	type MemoFont,
	type MemoTitle
} from './memo';

/*
 * The browser half of the memo exports: serialise the live chart drawing, load the shipped fonts
 * as data URLs (fetched from the app's own assets on first use, so they are not in the page's
 * first-load JavaScript), compose the figure and render PNGs with html-to-image.
 */

const FONT_FILES: Array<Omit<MemoFont, 'dataUrl'> & { url: string }> = [
	{ family: 'IBM Plex Sans', weight: 400, style: 'normal', url: plex400 },
	{ family: 'IBM Plex Sans', weight: 400, style: 'italic', url: plex400i },
	{ family: 'IBM Plex Sans', weight: 600, style: 'normal', url: plex600 },
	{ family: 'JetBrains Mono', weight: 400, style: 'normal', url: mono400 },
	{ family: 'JetBrains Mono', weight: 600, style: 'normal', url: mono600 }
];

let fontsLoading: Promise<MemoFont[]> | undefined;

function base64(buffer: ArrayBuffer): string {
	const bytes = new Uint8Array(buffer);
	let binary = '';
	for (let i = 0; i < bytes.length; i += 0x8000)
		binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
	return btoa(binary);
}

/** The shipped fonts as data URLs (cached after the first export). */
export function loadMemoFonts(): Promise<MemoFont[]> {
	fontsLoading ??= Promise.all(
		FONT_FILES.map(async ({ url, ...f }) => {
			const res = await fetch(url);
			if (!res.ok) throw new Error(`font ${url}: ${res.status}`);
			return { ...f, dataUrl: `data:font/woff2;base64,${base64(await res.arrayBuffer())}` };
		})
	).catch((e) => {
		fontsLoading = undefined;
		throw e;
	});
	return fontsLoading;
}

/** A chart drawing as a standalone SVG string with its on-screen size. */
export function serializeDrawing(el: SVGSVGElement): MemoDrawing {
	const box = el.getBoundingClientRect();
	const width = Math.round(box.width);
	const height = Math.round(box.height);
	const clone = el.cloneNode(true) as SVGSVGElement;
	clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
	clone.setAttribute('width', String(width));
	clone.setAttribute('height', String(height));
	clone.setAttribute('viewBox', `0 0 ${width} ${height}`);
	clone.removeAttribute('aria-describedby');
	clone.removeAttribute('class');
	clone.classList.add('swc-drawing');
	return { svg: new XMLSerializer().serializeToString(clone), width, height };
}

const frame = () => new Promise<void>((resolve) => requestAnimationFrame(() => resolve()));

/**
 * The live charts redrawn at `width` px and serialised: their container is narrowed for a moment
 * (the charts stack and redraw at that width, with their text at its on-screen size), then put
 * back. Waits, frame by frame, until every drawing has the new width; at most ~2 s.
 */
export async function drawingsAtWidth(
	get: () => SVGSVGElement[],
	width: number
): Promise<MemoDrawing[]> {
	const first = get()[0];
	const host = first?.closest<HTMLElement>(
		'[data-testid="sheet-charts"], [data-testid="path-charts"]'
	);
	if (!host) return get().map(serializeDrawing);
	const saved = host.style.cssText;
	host.style.width = `${width}px`;
	host.style.maxWidth = `${width}px`;
	try {
		for (let i = 0; i < 120; i++) {
			await frame();
			const els = get();
			if (els.length && els.every((el) => Math.round(el.getBoundingClientRect().width) <= width))
				break;
		}
		await frame();
		return get().map(serializeDrawing);
	} finally {
		host.style.cssText = saved;
	}
}

/** Composes the memo figure from live drawings: side by side as on screen, or stacked in a memo column. */
export async function memoFigure(
	drawings: () => SVGSVGElement[],
	title: MemoTitle,
	caution: string,
	findings: string[] = [],
	layout: 'wide' | 'column' = 'wide'
): Promise<MemoFigure> {
	const fonts = await loadMemoFonts();
	const d =
		layout === 'column'
			? await drawingsAtWidth(drawings, MEMO_COLUMN.widthPx - 16)
			: drawings().map(serializeDrawing);
	return composeMemoFigure({ drawings: d, title, caution, findings, fonts, layout });
}

/**
 * The figure as PNG at `pixelRatio` × its size (2 for documents, 4 for print, MEMO_COLUMN_PIXEL_RATIO
 * for a column figure: 1004 px, 85 mm at 300 dpi), rendered by html-to-image from an off-screen
 * copy so the page's theme cannot reach it.
 */
export async function memoPng(figure: MemoFigure, pixelRatio: number): Promise<Blob> {
	const host = document.createElement('div');
	host.setAttribute('aria-hidden', 'true');
	host.style.cssText = `position:fixed;left:-100000px;top:0;width:${figure.width}px;height:${figure.height}px;${Object.entries(
		PAPER_THEME
	)
		.map(([k, v]) => `${k}:${v}`)
		.join(';')}`;
	host.innerHTML = figure.svg;
	document.body.appendChild(host);
	try {
		// toBlob, not toPng + fetch(dataUrl): the page's CSP allows no fetch of data: URLs
		const blob = await toBlob(host, {
			pixelRatio,
			width: figure.width,
			height: figure.height,
			backgroundColor: PAPER_THEME['--sw-sheet'],
			fontEmbedCSS: figure.fontCss,
			style: { position: 'static', left: '0' },
			skipAutoScale: true
		});
		if (!blob) throw new Error('the browser made no image');
		return blob;
	} finally {
		host.remove();
	}
}

export { download, fileStem } from './names';
export { MEMO_COLUMN_PIXEL_RATIO } from './memo';
