// The built app served by `vite preview` on a free loopback port, and Debian's Chromium opened on it
// through playwright-core: shared by the browser tests (test/e2e/run.mjs) and the browser benchmark.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const CHROMIUM = process.env.COOLSTAGE_CHROMIUM ?? '/usr/bin/chromium';
/** Headless, no GPU, and no calls home: this machine's network is closed. */
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const SERVER_START_TIMEOUT_MS = 20_000;

/** A port nobody listens on now (other checkouts may run their own servers on the usual ones). */
function freePort() {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address();
      probe.close(() => resolve(port));
    });
  });
}

/**
 * Serve distDir and open Chromium; returns { baseUrl, context, close }. The server runs in its own
 * process group so close() ends it with everything it started.
 */
export async function openPreviewBrowser({ root, distDir, port, viewport = { width: 1280, height: 900 } }) {
  const usePort = port ?? (await freePort());
  const baseUrl = `http://127.0.0.1:${usePort}/`;
  const expectedIndex = readFileSync(join(distDir, 'index.html'), 'utf8');
  const child = spawn('npx', ['vite', 'preview', '--host', '127.0.0.1', '--port', String(usePort), '--strictPort', '--outDir', distDir], {
    cwd: root,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout.on('data', (d) => (log += d));
  child.stderr.on('data', (d) => (log += d));
  const profile = await mkdtemp(join(tmpdir(), 'coolstage-browser-'));
  let context;
  const close = async () => {
    await context?.close().catch(() => {});
    try {
      process.kill(-child.pid, 'SIGTERM');
    } catch {
      /* already gone */
    }
    await rm(profile, { recursive: true, force: true }).catch(() => {});
  };
  try {
    const until = Date.now() + SERVER_START_TIMEOUT_MS;
    let up = false;
    while (!up && Date.now() < until) {
      if (child.exitCode !== null) throw new Error(`vite preview exited early:\n${log}`);
      try {
        const r = await fetch(baseUrl);
        // Our own build, not another server that happens to hold the port.
        up = r.ok && (await r.text()) === expectedIndex;
      } catch {
        /* not up yet */
      }
      if (!up) await new Promise((r) => setTimeout(r, 150));
    }
    if (!up) throw new Error(`vite preview did not serve ${distDir} at ${baseUrl} within ${SERVER_START_TIMEOUT_MS} ms:\n${log}`);
    const { chromium } = await import('playwright-core');
    context = await chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: CHROMIUM_ARGS, viewport });
    return { baseUrl, context, close };
  } catch (e) {
    await close();
    throw e;
  }
}
