import type { Config } from 'tailwindcss';

// Farthing's own palette: paper and ink with copper (see DEVELOPERS.md, "Look").
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: '#F7F4EE',
        surface: '#FFFFFF',
        ink: '#1E2430',
        muted: '#5B6270',
        rule: '#E3DED4',
        copper: { DEFAULT: '#B5652B', dark: '#8E4B1C' },
        slate: { info: '#3D5A80' },
        verdigris: '#2E7D6F',
        ochre: '#C08A1E',
        brick: '#B23A26',
      },
      fontFamily: {
        sans: ['"Work Sans"', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
    },
  },
} satisfies Config;
