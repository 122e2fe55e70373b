// Benchmark of `lonepair check` on large CSV files (dist/cli.js, run as a child process like a
// user would): rows per second, the ratio to a plain streaming line count of the same file in
// the same run, and the checker's peak memory. Files are generated under the system temp folder
// and deleted afterwards. `npm run bench` builds first; `--strict` makes a missed aim exit 1.
//
// The line count is run the way the check is, as its own Node process, so both pay the same
// process start; the in-process count (no start-up) is printed beside it. Each is timed three
// times, taking turns, and the fastest run counts, so a busy moment on the machine does not
// decide the figure.
import { spawn } from "node:child_process";
import { createReadStream, createWriteStream, existsSync, mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { CYLINDER_HEADER, cylinderRow } from "./cylinderRows.mjs";

const cliPath = fileURLToPath(new URL("../../dist/cli.js", import.meta.url));
if (!existsSync(cliPath)) {
  console.error("dist/cli.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  process.exit(2);
}

const AIM_RATIO_TO_LINE_COUNT = 5;
const AIM_PEAK_MEGABYTES = 200;
const strict = process.argv.includes("--strict");
const missed = [];

const HEADER = `${CYLINDER_HEADER}\n`;
const row = (index) => `${cylinderRow(index)}\n`;

/** Writes a CSV of `rows` rows, or of about `bytes` bytes; resolves to the number of rows. */
async function generate(path, { rows, bytes }) {
  const out = createWriteStream(path);
  let written = HEADER.length;
  out.write(HEADER);
  let index = 0;
  const more = () => (rows !== undefined ? index < rows : written < bytes);
  while (more()) {
    let chunk = "";
    for (let count = 0; count < 10_000 && more(); count++, index++) {
      const line = row(index);
      chunk += line;
      written += line.length;
    }
    if (!out.write(chunk)) await new Promise((resolve) => out.once("drain", resolve));
  }
  await new Promise((resolve, reject) => out.end((error) => (error ? reject(error) : resolve())));
  return index;
}

/** Seconds to count the lines of `path` with a plain stream in this process: no start-up cost. */
async function lineCountSeconds(path) {
  const start = process.hrtime.bigint();
  let lines = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) {
    for (let index = chunk.indexOf(10); index >= 0; index = chunk.indexOf(10, index + 1)) lines++;
  }
  return { seconds: Number(process.hrtime.bigint() - start) / 1e9, lines };
}

/** Seconds for a Node process that counts the lines of `path` with a plain stream, start-up included. */
function lineCountProcessSeconds(path) {
  const script = `let lines = 0;
require("node:fs").createReadStream(${JSON.stringify(path)}, { highWaterMark: 1 << 20 })
  .on("data", (chunk) => { for (let index = chunk.indexOf(10); index >= 0; index = chunk.indexOf(10, index + 1)) lines++; })
  .on("end", () => process.stdout.write(String(lines)));`;
  return new Promise((resolve, reject) => {
    const start = process.hrtime.bigint();
    const child = spawn(process.execPath, ["-e", script], { stdio: ["ignore", "pipe", "inherit"] });
    let output = "";
    child.stdout.on("data", (chunk) => (output += chunk));
    child.on("error", reject);
    child.on("close", () => resolve({ seconds: Number(process.hrtime.bigint() - start) / 1e9, lines: Number(output) }));
  });
}

/** Runs `lonepair check --format json` on `path`; resolves to seconds, peak memory and findings. */
function checkRun(path) {
  // The child reports its own peak resident memory when it exits.
  const script = `process.argv = [process.argv[0], ${JSON.stringify(cliPath)}, "check", "--format", "json", ${JSON.stringify(path)}];
process.on("exit", () => require("node:fs").writeSync(2, "\\nPEAK_KB " + process.resourceUsage().maxRSS + "\\n"));
require(${JSON.stringify(cliPath)});`;
  return new Promise((resolve, reject) => {
    const start = process.hrtime.bigint();
    const child = spawn(process.execPath, ["-e", script], { stdio: ["ignore", "pipe", "pipe"] });
    let findings = 0;
    let stderr = "";
    child.stdout.on("data", (chunk) => {
      for (let index = chunk.indexOf(10); index >= 0; index = chunk.indexOf(10, index + 1)) findings++;
    });
    child.stderr.on("data", (chunk) => (stderr += chunk));
    child.on("error", reject);
    child.on("close", (status) => {
      const seconds = Number(process.hrtime.bigint() - start) / 1e9;
      const peak = /PEAK_KB (\d+)/.exec(stderr);
      // The JSON array has one finding a line between "[" and "]".
      resolve({ seconds, status, peakMegabytes: peak ? Number(peak[1]) / 1024 : NaN, findings: Math.max(findings - 2, 0), stderr });
    });
  });
}

const grouped = (value) => Math.round(value).toLocaleString("en-US");
const verdict = (met, label) => {
  if (!met) missed.push(label);
  return met ? "meets aim" : "MISSES aim";
};

async function bench(label, path, size) {
  const rows = await generate(path, size);
  const megabytes = statSync(path).size / (1024 * 1024);
  const inProcess = await lineCountSeconds(path);
  let count;
  let check;
  let peakMegabytes = 0;
  for (let run = 0; run < 3; run++) {
    const countRun = await lineCountProcessSeconds(path);
    const thisCheck = await checkRun(path);
    if (!count || countRun.seconds < count.seconds) count = countRun;
    if (!check || thisCheck.seconds < check.seconds) check = thisCheck;
    peakMegabytes = Math.max(peakMegabytes, thisCheck.peakMegabytes);
  }
  const ratio = check.seconds / count.seconds;
  const expectedFindings = Math.floor((rows - 6) / 997) + 1;
  console.log(
    `check ${label.padEnd(16)} ${grouped(rows).padStart(10)} rows ${megabytes.toFixed(0).padStart(4)} MB` +
      `  ${grouped(rows / check.seconds).padStart(8)} rows/s  (${check.seconds.toFixed(2)} s; line count ${count.seconds.toFixed(2)} s,` +
      ` ${inProcess.seconds.toFixed(2)} s of it counting)`,
  );
  console.log(
    `      ${"".padEnd(16)} ratio to line count ${ratio.toFixed(1).padStart(6)}x   aim <= ${AIM_RATIO_TO_LINE_COUNT}x   ${verdict(ratio <= AIM_RATIO_TO_LINE_COUNT, `${label} ratio`)}` +
      `;  peak memory ${check.peakMegabytes.toFixed(0)} MB` +
      (size.bytes ? `   aim < ${AIM_PEAK_MEGABYTES} MB   ${verdict(check.peakMegabytes < AIM_PEAK_MEGABYTES, `${label} memory`)}` : ""),
  );
  if (check.findings !== expectedFindings || check.status !== 0) {
    console.log(`      unexpected result: ${check.findings} findings (expected ${expectedFindings}), exit status ${check.status}`);
    missed.push(`${label} result`);
  }
}

const folder = mkdtempSync(join(tmpdir(), "lonepair-bench-"));
try {
  await bench("100,000 rows", join(folder, "rows-100k.csv"), { rows: 100_000 });
  await bench("200 MB", join(folder, "store-200mb.csv"), { bytes: 200 * 1024 * 1024 });
} finally {
  rmSync(folder, { recursive: true, force: true });
}
if (missed.length > 0) {
  console.log(`missed aims: ${missed.join(", ")}`);
  if (strict) process.exitCode = 1;
}
