import type { Config } from 'tailwindcss';

// Runrate's own palette: deep water ink, a reed green for actions, a pale mist ground that stays
// readable in sunlight, amber for cautions and a clear brick red for errors.
export default {
	content: ['./src/**/*.{html,js,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				ink: { DEFAULT: '#13242b', soft: '#3c4f57', faint: '#6a7b82' },
				reed: {
					50: '#eef6f2',
					100: '#d5eadf',
					500: '#2f7a62',
					600: '#23664f',
					700: '#1b5140',
					900: '#0f2e25'
				},
				mist: { DEFAULT: '#f5f7f4', line: '#d6dedb', deep: '#e7ece9' },
				sun: { 50: '#fdf6e7', 500: '#b7791f', 800: '#6b4510' },
				brick: { 50: '#fdf0ee', 600: '#b42318', 800: '#7a1a12' }
			},
			fontFamily: {
				sans: ['"Inter Variable"', 'ui-sans-serif', 'system-ui', 'sans-serif']
			}
		}
	}
} satisfies Config;
