/**
 * Vitest global setup: rebuilds dist/ when any source is newer than the bundles, so a test run
 * (a single file included) never exercises a stale server or command line.
 */
import { execFileSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = fileURLToPath(new URL("..", import.meta.url));
const SOURCES = ["shared/src", "server/src", "client/src"];
const BUNDLES = ["cli.js", "server.js", "client.js", "core.js"].map((name) => join(ROOT, "dist", name));

function newestSource(folder: string): number {
  let newest = 0;
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const path = join(folder, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(path) : statSync(path).mtimeMs);
  }
  return newest;
}

export default function setup(): void {
  const sources = Math.max(
    ...SOURCES.map((folder) => newestSource(join(ROOT, folder))),
    statSync(join(ROOT, "esbuild.config.mjs")).mtimeMs,
  );
  const stale = BUNDLES.some((bundle) => !existsSync(bundle) || statSync(bundle).mtimeMs < sources);
  if (stale) execFileSync(process.execPath, ["esbuild.config.mjs"], { cwd: ROOT, stdio: "inherit" });
}
