import type { Config } from 'tailwindcss';

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: '#FBF8F1',
        ink: '#1F2421',
        bark: '#5B4636',
        sap: '#C77D12',
        moss: '#3F6B4A',
        frost: '#E8EEF2',
        alert: '#A3362A',
        rule: '#DDD5C4',
        // Advice classes, from the Okabe–Ito colour-blind-safe palette.
        advice: {
          tap: '#009E73',
          reduced: '#E69F00',
          rest: '#56B4E9',
          small: '#CC79A7',
          retired: '#000000',
          unknown: '#999999',
        },
      },
      fontFamily: {
        sans: ['"Merriweather Sans"', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        sm: ['14px', '20px'],
        base: ['16px', '24px'],
        lg: ['20px', '28px'],
        xl: ['28px', '36px'],
      },
      maxWidth: { prose: '75ch' },
    },
  },
  plugins: [],
} satisfies Config;
