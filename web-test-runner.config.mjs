// Browser tests (test/web/**/*.test.ts) in Debian's Chromium, served through Vite
// (HyperFormula's CommonJS modules need Vite's pre-bundling). TOOLCHAIN.md records
// why each setting is here.
import { vitePlugin } from '@remcovaes/web-test-runner-vite-plugin';
import { chromeLauncher } from '@web/test-runner-chrome';
import { createServer } from 'node:net';

/** A port the OS reports free now, so that two checkouts can run their browser tests at once. */
async function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}
const vitePort = Number(process.env.WTR_VITE_PORT) || (await freePort());

const executablePath = process.env.CHROME_PATH || '/usr/bin/chromium';

export default {
  files: ['test/web/**/*.test.ts'],
  nodeResolve: true,
  concurrency: 1,
  testFramework: { config: { timeout: 20000 } },
  testsFinishTimeout: 300000,
  browsers: [
    chromeLauncher({
      launchOptions: {
        executablePath,
        headless: true,
        args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
      },
    }),
  ],
  plugins: [
    vitePlugin({
      configFile: false,
      root: process.cwd(),
      server: { port: vitePort, strictPort: true, host: '127.0.0.1' },
      worker: { format: 'es' },
      optimizeDeps: {
        exclude: ['@web/test-runner-commands'],
        include: ['lit', 'lit/decorators.js', 'lit/directives/live.js', 'lit/directives/if-defined.js', 'lit/directives/class-map.js', 'lit/directives/unsafe-svg.js', 'd3-array', 'chart.js', 'hyperformula', '@open-wc/testing', 'idb', 'ajv', 'ajv/dist/runtime/ucs2length.js', 'ml-matrix', 'papaparse/papaparse.js'],
      },
    }),
  ],
};
