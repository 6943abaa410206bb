import { defineConfig } from 'vite';

// The app is index.html + cells/ (page) + runtime/ (engine). Templates in
// docs-templates/ are imported as text at build time.
export default defineConfig({
  root: '.',
  build: {
    outDir: 'dist',
    target: 'es2022',
    chunkSizeWarningLimit: 2500,
  },
  server: { open: true },
});
