/**
 * The headless Chromium of the browser test, from the npm dev dependencies: no system package needed.
 *
 * `@sparticuz/chromium` ships a brotli-compressed Linux x64 build of Chromium's headless shell (with
 * a font and SwiftShader) inside the npm package. It is unpacked once per package version into
 * `node_modules/.cache/heatstate-chromium/<version>/` (into a temporary folder first, then renamed,
 * so a run that is stopped half-way or a second run at the same time never sees a partial binary)
 * and driven by playwright-core. `HEATSTATE_CHROMIUM_CACHE=/some/folder` unpacks there instead (a
 * read-only node_modules, or timing a run as a fresh clone makes it).
 *
 * Other browsers: `HEATSTATE_CHROMIUM=/usr/bin/chromium npm test` uses that executable instead (for
 * instance Debian's `chromium` package). Without the variable, when the npm binary cannot start (it
 * is built for Linux x64 only), an installed Debian/Ubuntu Chromium is tried next, with a warning
 * that says why and which executable it used.
 */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { arch, platform } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser } from 'playwright-core';

const root = fileURLToPath(new URL('../..', import.meta.url));
const SYSTEM_CHROMIUM = ['/usr/bin/chromium', '/usr/bin/chromium-browser'];
/** Flags for a headless run as root in a container, with no GPU and no network chatter. */
const ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

export interface LaunchedChromium {
  browser: Browser;
  /** Where the executable came from: `npm @sparticuz/chromium <version>`, `HEATSTATE_CHROMIUM` or `system`. */
  source: string;
  executable: string;
}

/** Unpacks the npm package's Chromium (once per version) and returns the executable and its fontconfig file. */
async function npmChromium(): Promise<{ executable: string; fontconfig: string; version: string }> {
  const require = createRequire(import.meta.url);
  const pkgDir = join(dirname(require.resolve('@sparticuz/chromium')), '..', '..');
  const { version } = JSON.parse(readFileSync(join(pkgDir, 'package.json'), 'utf8')) as { version: string };
  const cache = process.env.HEATSTATE_CHROMIUM_CACHE || join(root, 'node_modules', '.cache', 'heatstate-chromium');
  const target = join(cache, version);
  if (!existsSync(join(target, 'chromium'))) {
    mkdirSync(cache, { recursive: true });
    const work = mkdtempSync(join(cache, `${version}.unpacking-`));
    // the package unpacks into os.tmpdir(); point that at our folder for the duration of the call
    const saved = process.env.TMPDIR;
    process.env.TMPDIR = work;
    try {
      const { default: Chromium } = await import('@sparticuz/chromium');
      const unpacked = await Chromium.executablePath(join(pkgDir, 'bin'));
      if (unpacked !== join(work, 'chromium')) throw new Error(`@sparticuz/chromium unpacked to ${unpacked}, expected ${join(work, 'chromium')}`);
    } finally {
      if (saved === undefined) delete process.env.TMPDIR;
      else process.env.TMPDIR = saved;
    }
    // the package's fonts.conf names /tmp/fonts; ours names the unpacked font and the system's fonts
    writeFileSync(
      join(work, 'fonts.conf'),
      [
        '<?xml version="1.0"?>',
        '<!DOCTYPE fontconfig SYSTEM "fonts.dtd">',
        '<fontconfig>',
        '  <include ignore_missing="yes">/etc/fonts/fonts.conf</include>',
        `  <dir>${join(target, 'fonts', 'fonts')}</dir>`,
        `  <cachedir>${join(target, 'fontconfig-cache')}</cachedir>`,
        '</fontconfig>',
        '',
      ].join('\n'),
    );
    try {
      renameSync(work, target);
    } catch (e) {
      // another run finished first: use its copy
      rmSync(work, { recursive: true, force: true });
      if (!existsSync(join(target, 'chromium'))) throw e;
    }
  }
  return { executable: join(target, 'chromium'), fontconfig: join(target, 'fonts.conf'), version };
}

/** Launches headless Chromium: HEATSTATE_CHROMIUM if set, else the npm package's, else an installed one. */
export async function launchChromium(): Promise<LaunchedChromium> {
  const chosen = process.env.HEATSTATE_CHROMIUM;
  if (chosen) {
    if (!existsSync(chosen)) throw new Error(`HEATSTATE_CHROMIUM=${chosen}: no such file`);
    return { browser: await chromium.launch({ executablePath: chosen, args: ARGS }), source: 'HEATSTATE_CHROMIUM', executable: chosen };
  }
  const failures: string[] = [];
  if (platform() === 'linux' && arch() === 'x64') {
    try {
      const npm = await npmChromium();
      const browser = await chromium.launch({ executablePath: npm.executable, args: ARGS, env: { ...process.env, FONTCONFIG_FILE: npm.fontconfig } });
      return { browser, source: `npm @sparticuz/chromium ${npm.version}`, executable: npm.executable };
    } catch (e) {
      failures.push(`@sparticuz/chromium: ${(e as Error).message.split('\n')[0]}`);
    }
  } else {
    failures.push(`@sparticuz/chromium: ships Linux x64 only (this is ${platform()} ${arch()})`);
  }
  for (const executable of SYSTEM_CHROMIUM.filter((p) => existsSync(p))) {
    try {
      const browser = await chromium.launch({ executablePath: executable, args: ARGS });
      console.warn(`browser test: the npm Chromium could not start (${failures.join('; ')}); using ${executable}`);
      return { browser, source: 'system', executable };
    } catch (e) {
      failures.push(`${executable}: ${(e as Error).message.split('\n')[0]}`);
    }
  }
  throw new Error(`no headless Chromium could start:\n  ${failures.join('\n  ')}\nSet HEATSTATE_CHROMIUM to a Chromium or Chrome executable.`);
}
