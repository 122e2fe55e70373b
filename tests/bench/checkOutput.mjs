// Benchmark of `lonepair check` on one markdown file with millions of findings, in each output
// format: seconds, bytes written and the checker's peak memory. The core hands findings out a
// part at a time and every report is streamed, so no format may fail on the size of its output
// ("Invalid string length") and peak memory stays bounded whatever the number of findings. The
// file is generated under the system temp folder and deleted afterwards. `--findings N` sets the
// size (default 3,000,000, a 12 MB file); `--strict` makes a failed run or a missed aim exit 1.
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const cliPath = fileURLToPath(new URL("../../dist/cli.js", import.meta.url));
if (!existsSync(cliPath)) {
  console.error("dist/cli.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  process.exit(2);
}

const strict = process.argv.includes("--strict");
const sizeArgument = process.argv.indexOf("--findings");
const FINDINGS = sizeArgument > 0 ? Number(process.argv[sizeArgument + 1]) : 3_000_000;
/** Peak memory of the checker, whatever the number of findings: the document's text plus a few parts. */
const AIM_PEAK_MEGABYTES = 400;
// common practice: carbon holds at most four electron pairs, so every CH5 is an error.
const PER_LINE = 20;
const LINE = `${"CH5 ".repeat(PER_LINE)}\n`;

/** Runs `lonepair check --format <format>` on `path`, counting output bytes; peak memory from the child itself. */
function checkRun(format, path) {
  const script = `process.argv = [process.argv[0], ${JSON.stringify(cliPath)}, "check", "--format", ${JSON.stringify(format)}, ${JSON.stringify(path)}];
process.on("exit", () => require("node:fs").writeSync(2, "\\nPEAK_KB " + process.resourceUsage().maxRSS + "\\n"));
require(${JSON.stringify(cliPath)});`;
  return new Promise((resolve, reject) => {
    const start = process.hrtime.bigint();
    const child = spawn(process.execPath, ["-e", script], { stdio: ["ignore", "pipe", "pipe"] });
    let bytes = 0;
    let stderr = "";
    child.stdout.on("data", (chunk) => (bytes += chunk.length));
    child.stderr.on("data", (chunk) => (stderr += chunk));
    child.on("error", reject);
    child.on("close", (status) => {
      const peak = /PEAK_KB (\d+)/.exec(stderr);
      resolve({
        seconds: Number(process.hrtime.bigint() - start) / 1e9,
        status,
        bytes,
        peakMegabytes: peak ? Number(peak[1]) / 1024 : NaN,
        problem: stderr.replace(/\n?PEAK_KB \d+\n/, "").trim(),
      });
    });
  });
}

const folder = mkdtempSync(join(tmpdir(), "lonepair-bench-output-"));
const failed = [];
try {
  const path = join(folder, "run-99-many-findings.md");
  writeFileSync(path, LINE.repeat(Math.ceil(FINDINGS / PER_LINE)));
  const megabytes = statSync(path).size / (1024 * 1024);
  console.log(`check output: ${FINDINGS.toLocaleString("en-US")} findings in one ${megabytes.toFixed(1)} MB markdown file`);
  for (const format of ["text", "json", "sarif"]) {
    const run = await checkRun(format, path);
    // Every finding is an error, so the check's own status is 1; anything else is a failure.
    const ok = run.status === 1 && run.problem === "";
    const bounded = run.peakMegabytes <= AIM_PEAK_MEGABYTES;
    if (!ok || !bounded) failed.push(format);
    console.log(
      `  --format ${format.padEnd(6)} ${run.seconds.toFixed(1).padStart(7)} s  ${(run.bytes / (1024 * 1024)).toFixed(0).padStart(6)} MB written` +
        `  peak memory ${run.peakMegabytes.toFixed(0).padStart(5)} MB (aim <= ${AIM_PEAK_MEGABYTES} MB, ${bounded ? "meets aim" : "MISSES AIM"})` +
        `  ${ok ? "completed" : `FAILED (status ${run.status}: ${run.problem.slice(0, 200)})`}`,
    );
  }
} finally {
  rmSync(folder, { recursive: true, force: true });
}
if (failed.length > 0) {
  console.log(`failed formats: ${failed.join(", ")}`);
  if (strict) process.exitCode = 1;
}
