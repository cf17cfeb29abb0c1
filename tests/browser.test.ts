/**
 * examples/browser/index.html in headless Chromium (Debian's `chromium` package, driven by
 * playwright-core with executablePath; `.ci/run` installs chromium when it is missing).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { tmpdir } from 'node:os';
import { extname, join, normalize } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { water } from '../src/water/index.js';

const root = fileURLToPath(new URL('..', import.meta.url));
const CHROMIUM = process.env.HEATSTATE_CHROMIUM ?? '/usr/bin/chromium';
const TYPES: Record<string, string> = { '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.map': 'application/json' };

let server: Server;
let base = '';
let browser: Browser;

beforeAll(async () => {
  if (!existsSync(new URL('../dist/water/index.js', import.meta.url))) execFileSync('npm', ['run', 'build'], { cwd: root, stdio: 'pipe' });
  if (!existsSync(CHROMIUM)) throw new Error(`headless Chromium not found at ${CHROMIUM}: install it (apt-get install chromium) or set HEATSTATE_CHROMIUM`);
  // a static file server for the repository, on loopback only
  server = createServer((req, res) => {
    const path = normalize(decodeURIComponent(new URL(req.url ?? '/', 'http://localhost').pathname)).replace(/^(\.\.[/\\])+/, '');
    const file = join(root, path);
    if (!file.startsWith(root) || !existsSync(file)) {
      res.writeHead(404).end();
      return;
    }
    res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' }).end(readFileSync(file));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  base = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`;
  browser = await chromium.launch({
    executablePath: CHROMIUM,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await new Promise((resolve) => server?.close(resolve));
});

/** Width and height from a PNG's IHDR chunk. */
function pngSize(png: Buffer): [number, number] {
  expect(png.subarray(1, 4).toString('ascii')).toBe('PNG');
  return [png.readUInt32BE(16), png.readUInt32BE(20)];
}

describe('examples/browser/index.html', () => {
  it('imports the ESM build, computes a state in the page, and renders it', async () => {
    const page = await browser.newPage({ viewport: { width: 800, height: 600 } });
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
