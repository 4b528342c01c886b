import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The API runs on its own port in development; Vite proxies /api to it so cookies stay same-origin.
export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: { proxy: { '/api': `http://127.0.0.1:${process.env.PORT ?? 5180}` } },
  build: { outDir: 'dist', sourcemap: true, chunkSizeWarningLimit: 1200 },
});
