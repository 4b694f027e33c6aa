/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig({
  plugins: [react()],
  build: {
    outDir: 'dist',
    sourcemap: false,
    rollupOptions: {
      output: {
        // The libraries the editor always needs, each in a chunk of its own, so that no chunk
        // passes 500 kB and the browser caches them across releases of the editor's own code.
        // The PDF writer (jsPDF) and its fonts stay out of these: they load on export only.
        manualChunks(id: string): string | undefined {
          if (!id.includes('node_modules')) return undefined;
          if (/node_modules\/(react|react-dom|scheduler)\//.test(id)) return 'react';
          if (/node_modules\/(@xyflow|d3-[a-z]+|zustand|classcat)\//.test(id)) return 'flow';
          if (/node_modules\/zod\//.test(id)) return 'zod';
          if (/node_modules\/(dexie|immer|@dagrejs)\//.test(id)) return 'data';
          return undefined;
        },
      },
    },
  },
  preview: { port: 4173, host: '127.0.0.1' },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    exclude: ['e2e/**', 'node_modules/**'],
    environment: 'node',
    setupFiles: ['test/support/propertySeed.ts'],
  },
});
