import type { Config } from 'tailwindcss'

/**
 * Portwright's own palette, "copper on laminate". Components use these tokens,
 * never raw hex values.
 */
export default <Partial<Config>>{
  content: ['./app/**/*.{vue,ts}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f5f0', deep: '#efebe2', edge: '#ddd6c8' },
        ink: { DEFAULT: '#1f2a33', soft: '#4a5560', faint: '#7d8791' },
        copper: { DEFAULT: '#b4643c', dark: '#8f4c2c', light: '#e9c9b5', wash: '#f6e9e0' },
        wire: { DEFAULT: '#2f7f7a', light: '#cfe5e2' },
        alert: { DEFAULT: '#b3261e', wash: '#fbe9e7' },
        good: { DEFAULT: '#2e7d4f', wash: '#e6f3ea' },
        caution: { DEFAULT: '#8a6d1a', wash: '#fbf3dc' },
      },
      fontFamily: {
        sans: ['Inter', 'system-ui', 'sans-serif'],
      },
    },
  },
}
