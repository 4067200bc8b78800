import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// Vendor groups get their own chunks so that a route only pulls what it uses and caches survive
// app changes (STACK gotcha 12). Order matters: the first matching group with the highest priority wins.
const vendorGroups = [
  { name: 'vendor-react', test: /node_modules[\\/](react|react-dom|scheduler)[\\/]/, priority: 40 },
  {
    name: 'vendor-router',
    test: /node_modules[\\/](react-router|react-router-dom)[\\/]/,
    priority: 35,
  },
  { name: 'vendor-query', test: /node_modules[\\/]@tanstack[\\/]/, priority: 30 },
  {
    name: 'vendor-map',
    test: /node_modules[\\/](leaflet|react-leaflet|@react-leaflet)[\\/]/,
    priority: 30,
  },
  // Fluent's runtime (styling, focus management, theme, positioning) is needed by every page;
  // its components are left to the automatic splitting so a page only loads the ones it uses.
  {
    name: 'vendor-fluent-core',
    test: /node_modules[\\/](@griffel|tabster|keyborg|@floating-ui|@swc|@fluentui[\\/](react-provider|react-theme|tokens|react-utilities|react-shared-contexts|react-tabster|react-jsx-runtime|react-portal|react-positioning|react-motion|react-aria|react-context-selector|keyboard-keys))[\\/]/,
    priority: 20,
  },
  {
    name: 'vendor-charts',
    test: /node_modules[\\/](victory[^\\/]*|d3-[^\\/]+|lodash)[\\/]/,
    priority: 30,
  },
];

// Where the dev and preview servers send /api (the API's default port; override to try another).
const apiTarget = process.env.HOPWISE_API_URL ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  server: {
    port: 5173,
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  preview: {
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    manifest: true,
    rolldownOptions: {
      // @hopwise/common re-exports the physics core and its libraries from one index; the client
      // uses only a few pure pieces, so let tree-shaking drop the rest. Other modules keep the
      // default (their package.json `sideEffects`).
      treeshake: {
        moduleSideEffects: [{ test: /[\\/]common[\\/]dist[\\/]/, sideEffects: false }],
      },
      output: {
        codeSplitting: { groups: vendorGroups },
      },
    },
  },
});
