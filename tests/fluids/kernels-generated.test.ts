import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FLUID_KERNELS_PATH, renderFluidKernels } from '../../scripts/generate-kernels.js';

describe('src/fluids/kernels.generated.ts', () => {
  it('is current: regenerating from data/fluids gives the committed file (npm run kernels)', () => {
    expect(readFileSync(FLUID_KERNELS_PATH, 'utf8')).toBe(renderFluidKernels());
  });
});
