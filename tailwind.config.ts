import type { Config } from 'tailwindcss';

// Floorset's palette: warm paper and walnut by day, a deep dusk for the dim hall, one ember
// accent. Colours come from CSS variables (src/app.css) so the dark view swaps them in one place.
export default {
	content: ['./src/**/*.{html,svelte,ts}'],
	darkMode: 'class',
	theme: {
		extend: {
			colors: {
				paper: 'rgb(var(--paper) / <alpha-value>)',
				card: 'rgb(var(--card) / <alpha-value>)',
				ink: 'rgb(var(--ink) / <alpha-value>)',
				muted: 'rgb(var(--muted) / <alpha-value>)',
				line: 'rgb(var(--line) / <alpha-value>)',
				ember: 'rgb(var(--ember) / <alpha-value>)',
				'ember-ink': 'rgb(var(--ember-ink) / <alpha-value>)',
				sage: 'rgb(var(--sage) / <alpha-value>)',
				dusk: 'rgb(var(--dusk) / <alpha-value>)',
				alarm: 'rgb(var(--alarm) / <alpha-value>)'
			},
			fontFamily: {
				sans: ['"Atkinson Hyperlegible"', 'system-ui', 'sans-serif'],
				display: ['Fraunces', 'Georgia', 'serif']
			}
		}
	}
} satisfies Config;
