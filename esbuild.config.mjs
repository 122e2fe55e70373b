// Bundles every entry point into dist/ so the extension and the CLI ship as a handful of files.
import { build } from "esbuild";
import { existsSync } from "node:fs";

const entries = [
  { in: "server/src/cli/main.ts", out: "cli" },
  { in: "server/src/lsp/main.ts", out: "server" },
  // The language server's worker thread for the hover cards of large species.
  { in: "server/src/lsp/workerThread.ts", out: "workerThread" },
  { in: "client/src/extension.ts", out: "client" },
  // The bundled core, for the benchmark (tests/bench/run.mjs) and other plain Node scripts.
  { in: "shared/src/index.ts", out: "core" },
].filter((entry) => existsSync(entry.in));

// The 3D page's renderer, a browser script loaded by the webview next to client/media/shapeView.js.
const webviewBuild = build({
  entryPoints: { shapeScene: "client/webview/shapeSceneGlobal.ts" },
  outdir: "dist/webview",
  bundle: true,
  platform: "browser",
  target: "es2020",
  format: "iife",
  minify: true,
  logLevel: "warning",
});

await Promise.all([
  webviewBuild,
  ...entries.map((entry) =>
    build({
      entryPoints: { [entry.out]: entry.in },
      outdir: "dist",
      bundle: true,
      platform: "node",
      target: "node20",
      format: "cjs",
      sourcemap: true,
      external: ["vscode"],
      banner: entry.out === "cli" ? { js: "#!/usr/bin/env node" } : undefined,
      // The client ships as small as the language-client library allows; its map keeps traces readable.
      minify: entry.out === "client",
      logLevel: "warning",
    }),
  ),
]);
