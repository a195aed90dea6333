import fs from 'node:fs';
import { chromium, type BrowserContext } from 'playwright-core';
import { installDebianPackages } from '../../server/system/debian.ts';

/** Debian's chromium; never a browser downloaded by a test tool. */
export const CHROMIUM = '/usr/bin/chromium';

/** Flags for a headless chromium on a machine with no network but loopback. */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Install Debian's chromium when missing (as root with apt), else say what to install. */
export function ensureChromium(): string {
  if (fs.existsSync(CHROMIUM)) return CHROMIUM;
  installDebianPackages(['chromium'], (line) => process.stdout.write(`${line}\n`));
  if (!fs.existsSync(CHROMIUM))
    throw new Error('The browser tests need Debian\'s chromium: install it with "apt-get install chromium".');
  return CHROMIUM;
}

/** A headless chromium with its own throw-away profile folder. */
export function launchChromium(profileDir: string, viewport = { width: 1280, height: 860 }): Promise<BrowserContext> {
  return chromium.launchPersistentContext(profileDir, {
    executablePath: ensureChromium(),
    headless: true,
    viewport,
    args: CHROMIUM_ARGS,
  });
}
