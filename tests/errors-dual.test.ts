/**
 * One error class per kind across module formats: an error thrown by the CommonJS build is an
 * instance of the ESM build's classes and the other way round (both loaded into one process, as when
 * a CommonJS dependency and an ESM application both use heatstate). Runs on the built dist/.
 */
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { builtDist, importBuiltRoot } from './helpers/dist.js';

const dist = fileURLToPath(new URL('../dist/', import.meta.url));

beforeAll(() => builtDist());

describe('error classes across the ESM and CommonJS builds', () => {
  it('instanceof holds both ways, for the base class and each kind, and not across kinds', async () => {
    const esm = await importBuiltRoot();
    const cjs = createRequire(import.meta.url)(`${dist}index.cjs`) as typeof import('../src/index.js');
    expect(esm.OutOfRangeError).not.toBe(cjs.OutOfRangeError); // two copies really are loaded
    const fromCjs = (() => {
      try {
        cjs.water.state({ T: '5000 K', p: '1 MPa' });
      } catch (e) {
        return e;
      }
    })();
    const fromEsm = (() => {
      try {
        esm.quantity('1 furlong');
      } catch (e) {
        return e;
      }
    })();
    expect(fromCjs).toBeInstanceOf(esm.OutOfRangeError);
    expect(fromCjs).toBeInstanceOf(esm.HeatstateError);
    expect(fromCjs).toBeInstanceOf(cjs.OutOfRangeError);
    expect(fromCjs).not.toBeInstanceOf(esm.UnitError);
    expect(fromEsm).toBeInstanceOf(cjs.UnitError);
    expect(fromEsm).toBeInstanceOf(cjs.HeatstateError);
    expect(fromEsm).not.toBeInstanceOf(cjs.OutOfRangeError);
    expect(fromCjs).toBeInstanceOf(Error);
    expect(new Error('plain')).not.toBeInstanceOf(esm.HeatstateError);
  });
  it('a subclass of a user keeps the ordinary instanceof', async () => {
    const esm = await importBuiltRoot();
    class MyRangeError extends esm.OutOfRangeError {}
    const mine = new MyRangeError({ quantity: 'T', value: 1, min: 2, max: 3, unit: 'K', scope: 'test' });
    expect(mine).toBeInstanceOf(MyRangeError);
    expect(mine).toBeInstanceOf(esm.OutOfRangeError);
    expect(new esm.OutOfRangeError({ quantity: 'T', value: 1, min: 2, max: 3, unit: 'K', scope: 'test' })).not.toBeInstanceOf(MyRangeError);
  });
});
