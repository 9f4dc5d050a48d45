import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig, loadEnv } from 'vite';

// The API serves web/dist in production, so the client always calls /api on its own origin.
// In development Vite forwards /api to the local API; cookies pass through unchanged.
export default defineConfig(({ mode }) => {
  const env = loadEnv(mode, process.cwd(), '');
  const apiTarget = `http://127.0.0.1:${env.API_PORT || '4400'}`;
  const proxy = {
    '/api': { target: apiTarget, changeOrigin: false, xfwd: true },
  };

  return {
    plugins: [react()],
    resolve: {
      alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
    },
    server: { host: '127.0.0.1', port: Number(env.WEB_PORT || 5173), strictPort: true, proxy },
    preview: { host: '127.0.0.1', port: Number(env.WEB_PORT || 4173), proxy },
    build: {
      outDir: 'dist',
      emptyOutDir: true,
    },
  };
});
