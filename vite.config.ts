import { defineConfig } from 'vite';
import { contentSecurityPolicy } from './web/build/content-security-policy';

// The app: served from web/, built into dist-web/ as a static site (dist/ is the compiled package).
export default defineConfig({
  root: 'web',
  base: './',
  build: { outDir: '../dist-web', emptyOutDir: true, target: 'es2022' },
  worker: { format: 'es' },
  plugins: [contentSecurityPolicy()],
  server: { host: '127.0.0.1', port: 5173, strictPort: true },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
});
