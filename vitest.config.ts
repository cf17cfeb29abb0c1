import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const src = fileURLToPath(new URL('./src/', import.meta.url));

export default defineConfig({
  resolve: {
    // examples import 'heatstate' as users do; in tests that is the source tree
    alias: [
      { find: /^heatstate$/, replacement: `${src}index.ts` },
      { find: /^heatstate\/tables\/water$/, replacement: `${src}tables/water.ts` },
      { find: /^heatstate\/(.*)$/, replacement: `${src}$1/index.ts` },
    ],
  },
  test: {
    include: ['tests/**/*.test.ts'],
    testTimeout: 60_000,
  },
});
