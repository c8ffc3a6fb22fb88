/**
 * The browser the rendering tests drive: the system's Chromium (Debian: `apt-get install chromium`),
 * or the one CHROMIUM_PATH names. No test tool downloads a browser; without one the browser tests are
 * skipped with a message saying how to install it.
 */

import { existsSync } from 'node:fs';

const CANDIDATES = ['/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome', '/usr/bin/google-chrome-stable'];

export function systemBrowserPath(): string | undefined {
  const given = process.env.CHROMIUM_PATH;
  if (given) return existsSync(given) ? given : undefined;
  return CANDIDATES.find((path) => existsSync(path));
}

export const NO_BROWSER_MESSAGE =
  'Browser tests skipped: no Chromium found. Install one (Debian: apt-get install chromium) or set CHROMIUM_PATH to its executable.';
