/**
 * examples/browser/index.html in headless Chromium, driven by playwright-core. The browser comes from
 * the npm dev dependencies (@sparticuz/chromium; HEATSTATE_CHROMIUM picks another executable): see
 * tests/helpers/chromium.ts.
 */
import { existsSync, readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import { extname, join, normalize } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { water } from '../src/water/index.js';
import { launchChromium } from './helpers/chromium.js';
import { builtDist } from './helpers/dist.js';

const root = fileURLToPath(new URL('..', import.meta.url));
const TYPES: Record<string, string> = { '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.map': 'application/json' };

let server: Server | undefined;
let base = '';
let browser: Browser | undefined;

beforeAll(async () => {
  // the browser starts (and, on the first run, unpacks) while dist/ may still be building
  const [launched, built] = await Promise.allSettled([launchChromium(), builtDist()]);
  if (launched.status === 'fulfilled') browser = launched.value.browser;
  if (built.status === 'rejected') throw built.reason;
  if (launched.status === 'rejected') throw launched.reason;
  // a static file server for the repository, on loopback only
  const files = createServer((req, res) => {
    const path = normalize(decodeURIComponent(new URL(req.url ?? '/', 'http://localhost').pathname)).replace(/^(\.\.[/\\])+/, '');
    const file = join(root, path);
    if (!file.startsWith(root) || !existsSync(file)) {
      res.writeHead(404).end();
      return;
    }
    res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' }).end(readFileSync(file));
  });
  server = files;
  await new Promise<void>((resolve) => files.listen(0, '127.0.0.1', resolve));
  const address = files.address();
  base = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`;
}, 300_000);

// resolves at once for whatever beforeAll never created
afterAll(async () => {
  await browser?.close();
  const s = server;
  if (s) await new Promise<void>((resolve) => s.close(() => resolve()));
});

/** Width and height from a PNG's IHDR chunk. */
function pngSize(png: Buffer): [number, number] {
  expect(png.subarray(1, 4).toString('ascii')).toBe('PNG');
  return [png.readUInt32BE(16), png.readUInt32BE(20)];
}

describe('examples/browser/index.html', () => {
  it('imports the ESM build, computes a state in the page, and renders it', async () => {
    const page = await browser!.newPage({ viewport: { width: 800, height: 600 } });
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(`${base}/examples/browser/index.html`);
    await page.waitForSelector('body[data-state="ok"]', { timeout: 30_000 });
    const h = await page.textContent('td[data-name="h"]');
    expect(h).toBe(`${Number(water.state({ p: '10 MPa', T: '500 °C' }).h.in('kJ/kg').toPrecision(6))} kJ/kg`);
    expect(await page.textContent('td[data-name="phase"]')).toBe('vapor');
    expect(errors).toEqual([]);

    // the screenshot: a PNG of the viewport, and not the same picture as the page with no results
    const shot = await page.screenshot();
    expect(pngSize(shot)).toEqual([800, 600]);
    await page.fill('#T', '5000 K');
    await page.click('button');
    await page.waitForSelector('body[data-state="error"]');
    expect(await page.textContent('#error')).toMatch(/OutOfRangeError: T = 5000 K is above the upper limit/);
    const errorShot = await page.screenshot();
    expect(errorShot.equals(shot)).toBe(false);
    const dir = mkdtempSync(join(tmpdir(), 'heatstate-browser-'));
    writeFileSync(join(dir, 'state.png'), shot);
    await page.close();
  }, 60_000);
});
