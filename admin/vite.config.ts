import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { defineConfig, type ViteUserConfig as UserConfig } from 'vitest/config';

// The workspace packages are bundled from their TypeScript sources (their dist/ is for Node.js):
// the role × action matrix the API enforces, and the computation the API runs.
const permissions = fileURLToPath(new URL('../packages/permissions/src/index.ts', import.meta.url));
const batching = fileURLToPath(new URL('../packages/batching/src/', import.meta.url));
const api = process.env.POURGATE_API ?? 'http://127.0.0.1:3000';

const config = {
  base: './',
  plugins: [react()],
  resolve: {
    alias: [
      { find: /^@pourgate\/permissions$/, replacement: permissions },
      { find: /^@pourgate\/batching\/(.*)$/, replacement: `${batching}$1.ts` },
    ],
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // fonts and the logo ship as files, never as data: URLs inside the JS
    assetsInlineLimit: 0,
    // scripts/size.mjs walks the manifest to find what the first page loads
    manifest: true,
    sourcemap: false,
    chunkSizeWarningLimit: 900,
    rollupOptions: {
      output: {
        // the libraries every page needs, as separate files: fetched in parallel and kept in the
        // browser's cache across releases of the console's own code (one 750 kB script otherwise)
        manualChunks(id: string) {
          if (!id.includes('/node_modules/')) return undefined;
          if (/\/node_modules\/(react|react-dom|scheduler)\//.test(id)) return 'vendor-react';
          if (/\/node_modules\/(react-router|react-router-dom)\//.test(id)) return 'vendor-router';
          return undefined;
        },
      },
    },
  },
  server: {
    port: 5173,
    strictPort: true,
    proxy: {
      '/v1': { target: api, changeOrigin: false },
      '/docs': { target: api, changeOrigin: false },
    },
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/test/setup.ts'],
    restoreMocks: true,
    // a loaded machine (CI, several suites at once) takes seconds to mount a react-admin tree
    testTimeout: 20_000,
    // icons import @mui/material/utils; run them through Vite so they share the optimized copy
    server: { deps: { inline: [/@mui\/icons-material/] } },
    deps: {
      // without this react-router is loaded twice and its context is lost
      optimizer: {
        client: {
          enabled: true,
          include: [
            'react-admin',
            'ra-core',
            'ra-ui-materialui',
            'react-router',
            'react-router-dom',
            // one copy of emotion for react-admin and for our own MUI imports
            '@emotion/react',
            '@emotion/styled',
            '@mui/material',
            '@mui/material/styles',
            '@mui/material/utils',
            '@mui/material/SvgIcon',
          ],
        },
      },
    },
  },
} satisfies UserConfig;

export default defineConfig(({ command }) => {
  // A build is always the production one, even when the calling script (npm start) runs with
  // NODE_ENV=development: a development React bundle is bigger and logs every failed request.
  if (command === 'build') process.env.NODE_ENV = 'production';
  return config;
});
