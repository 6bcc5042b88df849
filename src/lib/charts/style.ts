/**
 * Style sheets that travel inside the chart's SVG elements, so an exported SVG keeps its look.
 * Colours come from the theme's CSS variables (light and dark) with the light theme's values as
 * fallbacks for a file opened on its own. Every rule is scoped to the chart's root class, since
 * a <style> inside inline SVG applies to the whole document.
 */

const MONO = `'JetBrains Mono', ui-monospace, monospace`;
const SANS = `'IBM Plex Sans', system-ui, sans-serif`;

const v = {
	sheet: 'var(--sw-sheet, #fbf8f1)',
	ink: 'var(--sw-ink, #2a2825)',
	inkSoft: 'var(--sw-ink-soft, #5e5951)',
	inkFaint: 'var(--sw-ink-faint, #a59d8e)',
	rule: 'var(--sw-rule, #d6ccb8)',
	accent: 'var(--sw-accent, #3346b8)',
	accentWash: 'var(--sw-accent-wash, #e3e6f7)',
	accentInk: 'var(--sw-accent-ink, #ffffff)',
	caution: 'var(--sw-caution, #a3361b)',
	dome: 'var(--sw-dome, rgb(51 70 184 / 0.06))'
};

const halo = `paint-order: stroke; stroke: ${v.sheet}; stroke-width: 3px; stroke-linejoin: round;`;

export const DRAWING_CSS = `
.swc-drawing { font-family: ${SANS}; }
.swc-drawing .swc-plate { fill: ${v.sheet}; }
.swc-drawing .swc-frame { fill: none; stroke: ${v.ink}; stroke-width: 1; shape-rendering: crispEdges; }
.swc-drawing .swc-grid line { stroke: ${v.rule}; stroke-width: 0.5; shape-rendering: crispEdges; }
.swc-drawing .swc-tick { stroke: ${v.ink}; stroke-width: 0.75; shape-rendering: crispEdges; }
.swc-drawing .swc-num { font-family: ${MONO}; font-size: 10px; fill: ${v.inkSoft}; font-variant-numeric: tabular-nums; }
.swc-drawing .swc-title { font-size: 11.5px; fill: ${v.inkSoft}; }
.swc-drawing .swc-title .swc-sym { font-style: italic; fill: ${v.ink}; }
.swc-drawing .swc-title .swc-unit { font-family: ${MONO}; font-size: 10.5px; }
.swc-drawing .swc-dome-fill { fill: ${v.dome}; stroke: none; }
.swc-drawing .swc-dome-line { fill: none; stroke: ${v.ink}; stroke-width: 1.5; stroke-linejoin: round; }
.swc-drawing .swc-triple { stroke: ${v.inkSoft}; stroke-width: 0.9; stroke-dasharray: 1 3; stroke-linecap: round; }
.swc-drawing .swc-melting { fill: none; stroke: ${v.inkSoft}; stroke-width: 1; stroke-dasharray: 5 2 1 2; stroke-linejoin: round; }
.swc-drawing .swc-isoline { fill: none; stroke: ${v.inkFaint}; stroke-width: 0.7; }
.swc-drawing .swc-iso-label { font-family: ${MONO}; font-size: 9.5px; fill: ${v.inkSoft}; ${halo} }
.swc-drawing .swc-limit { fill: none; stroke: ${v.caution}; stroke-linecap: butt; }
.swc-drawing .swc-limit-label { font-size: 10.5px; font-weight: 600; fill: ${v.caution}; ${halo} }
.swc-drawing .swc-limit-label .swc-unit { font-family: ${MONO}; font-weight: 400; }
.swc-drawing .swc-trace-line { fill: none; stroke: ${v.inkSoft}; stroke-width: 1; stroke-opacity: 0.8; }
.swc-drawing .swc-trace-mark { fill: none; stroke: ${v.inkSoft}; stroke-width: 1; }
.swc-drawing .swc-trace-band { fill: none; stroke: ${v.ink}; stroke-width: 1.75; stroke-dasharray: 0 3.5; stroke-linecap: round; stroke-opacity: 0.75; }
.swc-drawing .swc-revision-line { fill: none; stroke: ${v.inkSoft}; stroke-width: 6; stroke-opacity: 0.28; stroke-linecap: round; stroke-linejoin: round; }
.swc-drawing .swc-leg-casing { fill: none; stroke: ${v.sheet}; stroke-linecap: round; stroke-linejoin: round; }
.swc-drawing .swc-leg.is-selected .swc-leg-casing { stroke: ${v.accentWash}; }
.swc-drawing .swc-leg-line { fill: none; stroke-linecap: round; stroke-linejoin: round; }
.swc-drawing .is-preview .swc-leg-line { stroke-opacity: 0.6; }
.swc-drawing .swc-crossing { fill: ${v.sheet}; stroke: ${v.ink}; stroke-width: 1.25; }
.swc-drawing .swc-state-disc { fill: ${v.ink}; stroke: ${v.sheet}; stroke-width: 1.5; }
.swc-drawing .swc-state-text { font-family: ${MONO}; font-size: 8.5px; font-weight: 600; fill: ${v.sheet}; text-anchor: middle; }
.swc-drawing .swc-state-ring { fill: none; stroke: ${v.accent}; stroke-width: 2.25; visibility: hidden; }
.swc-drawing .swc-state.is-selected .swc-state-ring { visibility: visible; }
.swc-drawing .swc-cp { fill: ${v.sheet}; stroke: ${v.ink}; stroke-width: 1.25; }
.swc-drawing .swc-cp-label { font-size: 10.5px; font-style: italic; fill: ${v.ink}; ${halo} }
.swc-drawing .swc-key-text { font-size: 11px; fill: ${v.inkSoft}; }
.swc-drawing .swc-note-flag path { fill: ${v.accent}; stroke: ${v.sheet}; stroke-width: 1.5; }
.swc-drawing .swc-note-flag-sample { fill: ${v.accent}; stroke: ${v.sheet}; stroke-width: 1; }
.swc-drawing .swc-note-flag text { font-family: ${MONO}; font-size: 10.5px; font-weight: 600; fill: ${v.accentInk}; text-anchor: middle; }
`;

export const OVERLAY_CSS = `
.swc-overlay { touch-action: none; }
.swc-overlay .swc-bg { fill: transparent; cursor: grab; }
.swc-overlay.is-adding .swc-bg { cursor: crosshair; }
.swc-overlay .swc-hit-leg { fill: none; stroke: transparent; stroke-width: 14px; stroke-linecap: round; stroke-linejoin: round; pointer-events: stroke; cursor: pointer; }
.swc-overlay .swc-hit-leg:focus { outline: none; }
.swc-overlay .swc-hit-leg:focus-visible { stroke: ${v.accent}; stroke-opacity: 0.3; }
.swc-overlay .swc-hit-state { fill: transparent; cursor: grab; }
.swc-overlay .swc-hit-state.is-locked { cursor: pointer; }
.swc-overlay .swc-hit-state:focus { outline: none; }
.swc-overlay .swc-hit-state:focus-visible { stroke: ${v.accent}; stroke-width: 2px; stroke-dasharray: 3 2.5; }
.swc-overlay .swc-cross { stroke: ${v.accent}; stroke-width: 0.75; stroke-dasharray: 2 3; pointer-events: none; shape-rendering: crispEdges; }
.swc-overlay .swc-ghost { fill: none; stroke: ${v.accent}; stroke-width: 1.5; stroke-dasharray: 2 2; pointer-events: none; }
.swc-overlay .swc-ghost.is-clamped { stroke: ${v.caution}; }
`;
