/**
 * Debian's Chromium, started headless the one way that works on these machines: no sandbox (we
 * run as root), no GPU, and no background networking (the machine has no outside network).
 */
import { chromium, type BrowserContext } from "playwright-core";

export const CHROMIUM = "/usr/bin/chromium";

const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** A fresh persistent context on `userDataDir` with the given page size. */
export function launchHeadlessChromium(
  userDataDir: string,
  options: { viewport: { width: number; height: number }; deviceScaleFactor?: number },
): Promise<BrowserContext> {
  return chromium.launchPersistentContext(userDataDir, {
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_ARGS,
    ...options,
  });
}
