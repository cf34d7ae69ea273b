import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const sharedSource = (entry: string) =>
  fileURLToPath(new URL(`../shared/src/${entry}/index.ts`, import.meta.url));

// The shared package is read from its TypeScript sources so dev, build and tests never
// depend on a stale shared/dist; the type checker still goes through the package exports.
const sharedAliases = [
  { find: /^@channelwright\/shared\/schemas$/, replacement: sharedSource('schemas') },
  { find: /^@channelwright\/shared\/units$/, replacement: sharedSource('units') },
  { find: /^@channelwright\/shared\/device$/, replacement: sharedSource('device') },
];

export default defineConfig({
  plugins: [react()],
  resolve: { alias: sharedAliases },
  server: {
    port: 5173,
    proxy: { '/api': { target: 'http://localhost:3000', changeOrigin: false } },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    rolldownOptions: {
      output: {
        // Long-lived vendor chunks, so a deploy that changes only our code keeps them cached.
        // Charts, uploads and Mantine's components stay out: each loads with the pages that use it
        // (one Mantine chunk held every component of every page and put the first load at 266 kB gzipped;
        // split, 242 kB: client/bench/initial-bundle-bench.mjs).
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|react-router|react-router-dom|scheduler)[\\/]/ },
            { name: 'data', test: /node_modules[\\/](@tanstack|zod)[\\/]/ },
          ],
        },
      },
    },
  },
});
