import type { Config } from 'tailwindcss';

// Colours and shapes from the product's look (see DEVELOPERS.md, "Look").
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: '#14213d',
        paper: '#f7f7f2',
        accent: '#5b3fd1',
        hairline: '#d9d6cc',
        chrome: '#2b2d42',
        open: '#e9e6dc',
        added: '#1b9e77',
        removed: '#d95f02',
        warning: '#d95f02',
        error: '#b3261e',
      },
      borderRadius: { DEFAULT: '6px' },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
    },
  },
  plugins: [],
};

export default config;
