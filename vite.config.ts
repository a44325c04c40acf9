import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: {
      '@': new URL('./src', import.meta.url).pathname,
      // Charts import plotly through this name (lazily), so tests can vi.mock it and builds can swap the bundle.
      'plotly-impl': 'plotly.js-basic-dist-min',
    },
  },
  worker: { format: 'es' },
  build: { target: 'es2022', chunkSizeWarningLimit: 1600 },
  test: {
    environment: 'node',
    include: ['test/unit/**/*.test.ts', 'test/components/**/*.test.tsx', 'src/**/*.test.{ts,tsx}'],
  },
});
