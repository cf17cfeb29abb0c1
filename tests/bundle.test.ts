/**
 * What a consumer's bundle contains: decimal.js (build-time only) and data a subpath does not
 * need must never be pulled in. Bundles are built from the source entries with esbuild, minified.
 */
import { build } from 'esbuild';
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { readManifest, specifier } from '../scripts/entries.js';

const root = fileURLToPath(new URL('..', import.meta.url));

async function bundle(code: string): Promise<string> {
  const result = await build({
    stdin: { contents: code, resolveDir: root, loader: 'ts' },
    bundle: true,
    minify: true,
    format: 'esm',
    platform: 'neutral',
    write: false,
    alias: Object.fromEntries(readManifest().entries.map((e) => [specifier(e), `./${e.source}`])),
  });
  return result.outputFiles[0]!.text;
}

describe('consumer bundles', () => {
  it('heatstate/units carries no decimal.js, zod or substance data', async () => {
    const js = await bundle(`import { quantity } from 'heatstate/units'; console.log(quantity('1 psia').in('kPa'));`);
    expect(js).not.toMatch(/decimal\.js|DecimalError|toSignificantDigits/);
    expect(js).not.toMatch(/ZodError|zod/i);
    expect(js).not.toContain('stainless steel');
    const kB = gzipSync(js).length / 1024;
    // 12.3 kB measured: the budget grew from 8 kB with quantity arithmetic (the product and quotient
    // tables), four new dimensions, the plant and HVAC units and the linear-time parser with its
    // limits. The compound units' keys ship with their factors (0.4 kB): deriving them from the
    // spellings on first use instead (11.9 kB) cost the first unit read in a process 11 to 14 ms
    expect(kB).toBeLessThan(12.5);
  });
  it('heatstate/units + heatstate/ideal-gas: at most 29 kB gzipped, no decimal.js, zod or incompressible data', async () => {
    const js = await bundle(`import { quantity } from 'heatstate/units'; import { idealGas, mixture, compressor } from 'heatstate/ideal-gas';
      console.log(quantity('1 psia').in('kPa'), idealGas('N2').cp('300 K'), mixture({ N2: 0.79, O2: 0.21 }), compressor);`);
    expect(js).not.toMatch(/DecimalError|toSignificantDigits/);
    expect(js).not.toMatch(/ZodError/);
    expect(js).not.toContain('stainless steel');
    const kB = gzipSync(js).length / 1024;
    // 25.9 kB measured: from 15 kB with the units above and the species data (20 species now fitted to
    // NIST-JANAF in the 9-constant form, 200 to 6000 K, with their provenance); 27.9 kB with the
    // dilute-gas transport facade every gas now carries (Lennard-Jones data, collision integral, mixing)
    expect(kB).toBeLessThan(29);
  });
  it('heatstate/incompressible: at most 64 kB gzipped, no decimal.js', async () => {
    const js = await bundle(`import { incompressible } from 'heatstate/incompressible'; console.log(incompressible('water'));`);
    expect(js).not.toMatch(/DecimalError|toSignificantDigits/);
    // 60.9 kB measured: the catalogue's data (with transport tables), zod for user definitions, the
    // brine grids, and for liquid water's transport IF97 regions 1 and 4, IAPWS R12-08/R15-11 and the
    // IAPWS-95 water equation (its entry alone, not the fluid catalogue)
    expect(gzipSync(js).length / 1024).toBeLessThan(64);
  });
});

describe('humid-air bundle', () => {
  // the goal of the humid-air issue is 20 kB, not yet met. Minified bytes by source at 27.9 kB gzipped
  // (before the compound-unit keys, 0.4 kB, shipped again):
  // the units layer 35.5 kB (quantity, registry, arithmetic, factors, spellings, parser), the humid-air
  // facade 19.3 kB (with its batch), its SI core 12.4 kB, the facade kit, batch runner and errors
  // 10.7 kB, IF97 (region 4, and h alone from regions 1 and 2) 4.6 kB.
  it('heatstate/humid-air: at most 28.5 kB gzipped, without decimal.js, zod, substance data, steam tables, IF97 regions 3 and 5 or the provenance text of its data files', async () => {
    const js = await bundle(`import { humidAir, humidAirBatch } from 'heatstate/humid-air';
      const s = humidAir.state({ T: '30 °C', RH: 0.5 });
      console.log(s, humidAir.coolingCoil({ inlet: s, flow: '1 kg/s', ADP: '10 °C', bypassFactor: 0.1 }), humidAirBatch);`);
    expect(js).not.toMatch(/DecimalError|toSignificantDigits|ZodError/);
    expect(js).not.toContain('stainless steel');
    expect(js).not.toMatch(/water-saturation-by|superheated-vapor/);
    // IF97 region 3 (Table 30, n1) and region 5 (Table 37, n1 of the ideal part) are not needed
    expect(js).not.toMatch(/1\.0658070028513|-0\.13179983674201e2|-13\.179983674201/);
    // nor the full region 1 and 2 sums: the processes take h alone (region1Enthalpy, region2Enthalpy).
    // Fingerprints: region 1 n1 (Table 2, J = −2: only γ itself carries n1 bare) and region 2 residual
    // n1 (Table 11, I = 1, J = 0: in γʳ and γʳ_π, absent from γʳ_τ)
    expect(js).not.toMatch(/14632971213167|17731742473213/);
    // the humid-air data files are imported by name: their numbers ship, their source and uncertainty text does not
    expect(js).not.toMatch(/Melting and Sublimation Curves|equation numbers from memory/);
    // 28.3 kB measured (33.9 → 33.4 kB with the humid-air data files imported by name, → 32.1 kB with
    // the IF97 changes above, → 31.7 kB with the batch sets solved by their loops alone, → 27.9 kB with
    // the enthalpy-only IF97 kernels, → 28.3 kB with the compound-unit keys shipped again), above the
    // issue's 20 kB target; this ceiling guards against growth. Of the rest, the units layer is about
    // 11 kB (its own entry 11.9 kB): the quantity arithmetic, the unit registry and parser every
    // facade reads its text with
    expect(gzipSync(js).length / 1024).toBeLessThan(28.5);
  });
});

describe('water bundle', () => {
  it('heatstate/water: at most 70 kB gzipped, without decimal.js, substance data or the generated tables', async () => {
    const js = await bundle(`import { water } from 'heatstate/water'; console.log(water.state({ p: '1 MPa', T: '500 K' }), water.saturation({ T: '400 K' }));`);
    expect(js).not.toMatch(/DecimalError|toSignificantDigits/);
    expect(js).not.toContain('stainless steel');
    expect(js).not.toMatch(/water-saturation-by|superheated-vapor/);
    // the IAPWS-95 enhancement inputs take the water equation alone, not the fluid catalogue
    expect(js).not.toMatch(/nitrogen/i);
    // 65.8 kB measured (67.4 before the IAPWS-95 enhancement inputs stopped loading the fluid catalogue): from
    // 40 kB with the units above and the transport properties on every state
    // (IAPWS R12-08, R15-11, R1-76 and the IAPWS-95 equation their critical enhancements need)
    expect(gzipSync(js).length / 1024).toBeLessThan(70);
  });
  it('heatstate/water with the liquid-water shortcuts: no incompressible catalogue, zod or nitrogen equation', async () => {
    const js = await bundle(`import { water, approximateLiquid, compareLiquidProcess } from 'heatstate/water'; console.log(water.state({ p: '1 MPa', T: '500 K' }), approximateLiquid, compareLiquidProcess);`);
    expect(js).not.toContain('stainless steel');
    expect(js).not.toMatch(/ZodError|nitrogen/i);
  });
  it('heatstate/ideal-gas pulls in no water code', async () => {
    const js = await bundle(`import { idealGas } from 'heatstate/ideal-gas'; console.log(idealGas('N2').cp('300 K'));`);
    // coefficients of IF97 region 1 (Table 2, n1) and region 3 (Table 30, n1) must not appear, nor table data
    expect(js).not.toMatch(/0\.14632971213167|1\.0658070028513|IAPWS/);
    expect(js).not.toMatch(/water-saturation-by|superheated-vapor/);
  });
});

describe('fluids bundle', () => {
  const use = `import { fluid } from 'heatstate/fluids'; const w = fluid('water'); console.log(w.state({ T: '300 K', p: '1 bar' }), w.saturation({ T: '400 K' }), w.deltaH({ T: '300 K', p: '1 bar' }, { p: '1 bar', x: 1 }));`;
  it('heatstate/fluids with one fluid (IAPWS-95 water, the other catalogue entries left out): at most 30 kB gzipped, without zod, the table layer, IF97 or decimal.js', async () => {
    // a build with one fluid: every catalogue entry but water's is replaced by an absent one
    const result = await build({
      stdin: { contents: use, resolveDir: root, loader: 'ts' },
      bundle: true,
      minify: true,
      format: 'esm',
      platform: 'neutral',
      write: false,
      alias: Object.fromEntries(readManifest().entries.map((e) => [specifier(e), `./${e.source}`])),
      plugins: [
        {
          name: 'one-fluid',
          setup(b) {
            b.onResolve({ filter: /\/entries\/[\w-]+\.js$/ }, (args) => (/\/(water|entry)\.js$/.test(args.path) ? undefined : { path: args.path, namespace: 'absent-fluid' }));
            b.onLoad({ filter: /.*/, namespace: 'absent-fluid' }, (args) => ({ contents: `export const ${args.path.replace(/^.*\/|\.js$/g, '')} = undefined;`, loader: 'js' }));
          },
        },
      ],
    });
    const js = result.outputFiles[0]!.text;
    expect(js).not.toMatch(/DecimalError|toSignificantDigits/);
    expect(js).not.toMatch(/ZodError/);
    expect(js).not.toMatch(/interpolationError|monotone-cubic/);
    // IF97 region 1 (Table 2, n1) must not appear; nor the IAPWS-95 coefficient arrays of the data file (kernels carry them); nor nitrogen
    expect(js).not.toMatch(/0\.14632971213167/);
    expect(js).not.toMatch(/Table 2, i = 8\.\.51/);
    expect(js).not.toMatch(/Span et al\. 2000|\.924803575275/);
    expect(gzipSync(js).length / 1024).toBeLessThan(30);
  });
  it('heatstate/fluids with its whole catalogue (water and nitrogen): at most 34 kB gzipped', async () => {
    const js = await bundle(use);
    expect(js).toMatch(/\.924803575275/);
    expect(gzipSync(js).length / 1024).toBeLessThan(34);
  });
});
