import type { Config } from 'tailwindcss';

// Runrate's own palette: deep water ink, a reed green for actions, a pale mist ground that stays
// readable in sunlight, amber for cautions and a clear brick red for errors.
// Contrast (WCAG 2.2, checked by the e2e accessibility gate): every text colour here is at least 4.5:1 on
// white, mist and mist.deep (ink.faint, the palest, is 5.9, 5.5 and 4.9:1); mist.edge, the outline of
// form controls, is at least 3:1 on every ground it sits on (3.8 on white, 3.2 on mist.deep); mist.line
// (1.4:1) only divides content and never marks a control. sun.500 and reed.500 are for fills and
// borders only: as text, use sun.800 and reed.700.
export default {
	content: ['./src/**/*.{html,js,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				ink: { DEFAULT: '#13242b', soft: '#3c4f57', faint: '#56676e' },
				reed: {
					50: '#eef6f2',
					100: '#d5eadf',
					500: '#2f7a62',
					600: '#23664f',
					700: '#1b5140',
					900: '#0f2e25'
				},
				mist: { DEFAULT: '#f5f7f4', line: '#d6dedb', deep: '#e7ece9', edge: '#74858b' },
				sun: { 50: '#fdf6e7', 500: '#b7791f', 800: '#6b4510' },
				brick: { 50: '#fdf0ee', 600: '#b42318', 800: '#7a1a12' }
			},
			fontFamily: {
				sans: ['"Inter Variable"', 'ui-sans-serif', 'system-ui', 'sans-serif']
			}
		}
	}
} satisfies Config;
