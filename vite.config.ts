import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The web app lives in web/; the API serves the built files from dist/web in production and
// answers /api itself. In development Vite proxies /api to the running API so cookies stay
// same-origin.
const apiPort = process.env.PORT ?? '3000';

export default defineConfig({
  root: 'web',
  publicDir: false,
  plugins: [react(), tailwindcss()],
  build: {
    outDir: '../dist/web',
    emptyOutDir: true,
    // Route screens are lazy; the first screen should stay well under 250 KB gzipped.
    chunkSizeWarningLimit: 600,
  },
  server: {
    proxy: {
      '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false },
    },
  },
});
