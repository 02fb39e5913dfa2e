// Client build: React + Tailwind, served by the Express process in production (api/app.ts).
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

export default defineConfig({
  root: 'app',
  publicDir: false,
  plugins: [react(), tailwindcss()],
  resolve: { alias: { '@shared': new URL('./shared', import.meta.url).pathname } },
  build: {
    outDir: '../dist/app',
    emptyOutDir: true,
    sourcemap: true,
    // Second entry: the page the print renderer (api/render/render-3d.ts) loads to draw 3D figures.
    rollupOptions: {
      input: {
        main: new URL('./app/index.html', import.meta.url).pathname,
        'print-3d': new URL('./app/print-3d.html', import.meta.url).pathname,
      },
    },
  },
  worker: { format: 'es' },
  server: {
    port: 5173,
    proxy: { '/api': 'http://127.0.0.1:4650' },
  },
});
