import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { compression } from 'vite-plugin-compression2';
import { defineConfig } from 'vitest/config';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // .br and .gz beside every text file over 1 KB, served by server/lib/client-files.ts without compressing per request.
    compression({ algorithms: ['brotliCompress', 'gzip'], threshold: 1024 }),
  ],
  resolve: { alias },
  // Static files live inside src/ so that the top level keeps only the fixed folders.
  publicDir: 'src/public',
  server: {
    port: 5173,
    proxy: { '/api': `http://localhost:${process.env.PORT ?? 3000}` },
  },
  build: {
    outDir: 'dist',
    sourcemap: false,
    manifest: true,
    chunkSizeWarningLimit: 600,
    // zod builds every schema kind with $constructor(); marked pure, the kinds the client never uses are left out.
    rolldownOptions: { treeshake: { manualPureFunctions: ['$constructor'] } },
  },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'node',
          environment: 'node',
          include: ['tests/shared/**/*.test.ts', 'tests/server/**/*.test.ts'],
          testTimeout: 20000,
          hookTimeout: 30000,
        },
      },
      {
        plugins: [react()],
        resolve: { alias },
        test: {
          name: 'client',
          environment: 'jsdom',
          include: ['tests/client/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/client/setup.ts'],
        },
      },
    ],
  },
});
