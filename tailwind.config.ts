import type { Config } from 'tailwindcss';

// Orthogon's look: warm paper, deep ink, one teal accent. Long sessions favour low glare and
// quiet colour; the status colours are kept for clashes and cautions so they keep their meaning.
export default {
	content: ['./src/**/*.{html,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				paper: '#f6f5f1',
				surface: '#ffffff',
				sunken: '#eeede7',
				line: '#d6d8d2',
				ink: { DEFAULT: '#1c2830', soft: '#3b4a54', muted: '#56646d' },
				accent: { DEFAULT: '#276a64', strong: '#1d4f4a', soft: '#e3efed' },
				clash: { DEFAULT: '#9f3424', soft: '#f8e6e2' },
				caution: { DEFAULT: '#7a5a0c', soft: '#f6eed6' },
				fine: { DEFAULT: '#2c6637', soft: '#e4f0e5' }
			},
			fontFamily: {
				sans: ['Lato', 'system-ui', 'sans-serif'],
				mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'monospace']
			},
			borderRadius: { sm: '3px', DEFAULT: '5px', md: '6px', lg: '10px' },
			boxShadow: { card: '0 1px 2px rgb(28 40 48 / 0.06), 0 1px 1px rgb(28 40 48 / 0.04)' }
		}
	}
} satisfies Config;
