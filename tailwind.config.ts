import type { Config } from 'tailwindcss';

/**
 * Statewright design tokens. Colours resolve to CSS custom properties defined in
 * src/app.css so that the light ("drafting paper") and dark ("slate and chalk") themes
 * swap by a single attribute on <html>. Use these names in markup, never raw hex.
 */
export default {
	content: ['./src/**/*.{html,svelte,ts}'],
	darkMode: ['selector', '[data-theme="dark"]'],
	theme: {
		extend: {
			colors: {
				paper: 'var(--sw-paper)', // page background
				sheet: 'var(--sw-sheet)', // raised surfaces: panels, cards, chart plate
				well: 'var(--sw-well)', // inset areas: inputs, table stripes
				ink: 'var(--sw-ink)', // primary text and drawn lines
				'ink-soft': 'var(--sw-ink-soft)', // secondary text, axis labels
				'ink-faint': 'var(--sw-ink-faint)', // hairlines, isolines, disabled
				rule: 'var(--sw-rule)', // borders and dividers
				accent: 'var(--sw-accent)', // the one colour for selected / active
				'accent-ink': 'var(--sw-accent-ink)', // text on an accent fill
				'accent-wash': 'var(--sw-accent-wash)', // faint accent background
				caution: 'var(--sw-caution)', // design-limit and safety warnings
				'caution-wash': 'var(--sw-caution-wash)',
				ok: 'var(--sw-ok)',
				'ok-wash': 'var(--sw-ok-wash)',
				dome: 'var(--sw-dome)', // vapor-dome tint
				// Okabe–Ito colour-blind-safe palette for legs (always paired with a dash pattern)
				leg: {
					1: '#0072B2',
					2: '#D55E00',
					3: '#009E73',
					4: '#CC79A7',
					5: '#E69F00',
					6: '#56B4E9',
					7: '#F0E442'
				}
			},
			fontFamily: {
				sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
				mono: ['"JetBrains Mono"', 'ui-monospace', 'monospace']
			},
			fontSize: {
				// a 1.2 modular scale on a 15 px body
				micro: ['0.6875rem', { lineHeight: '1rem' }],
				small: ['0.8125rem', { lineHeight: '1.25rem' }],
				body: ['0.9375rem', { lineHeight: '1.5rem' }],
				lead: ['1.125rem', { lineHeight: '1.75rem' }],
				title: ['1.375rem', { lineHeight: '1.875rem' }],
				display: ['1.75rem', { lineHeight: '2.25rem' }]
			},
			spacing: {
				gutter: '1.25rem',
				panel: '22rem'
			},
			borderRadius: {
				chip: '0.25rem',
				card: '0.375rem'
			},
			boxShadow: {
				plate: '0 1px 0 var(--sw-rule), 0 2px 8px -4px rgb(0 0 0 / 0.18)'
			}
		}
	}
} satisfies Config;
