/// <reference types="vitest/config" />
import { fileURLToPath, URL } from 'node:url'
import { defineConfig } from 'vite'
import vue from '@vitejs/plugin-vue'

const apiPort = Number(process.env.PORT ?? 3000)

export default defineConfig({
  plugins: [vue()],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
    },
  },
  worker: { format: 'es' },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: { outDir: 'dist', chunkSizeWarningLimit: 900 },
  test: {
    include: ['tests/**/*.test.ts', 'server/**/*.test.ts', 'shared/**/*.test.ts'],
    environment: 'node',
    setupFiles: ['tests/setup/fast-check.ts'],
    // Integration tests share one PostgreSQL database: run files one at a time.
    fileParallelism: false,
    // Generous: the property and corpus tests take seconds on a quiet machine and
    // several times longer beside another CPU-heavy process; a hang still fails.
    testTimeout: 180_000,
    hookTimeout: 120_000,
  },
})
