// Benchmark of the language server on very large files, driven over stdio by a protocol client:
// a hover sent while a 10 MB notebook is being analysed (after opening it and after an edit),
// one-line edits to that notebook and its peak memory, the same for a 10 MB plain-text lab log,
// and the server's peak memory while a 50 MB cylinder CSV is opened and edited ten times.
// Prints the figures beside the aims and the machine's load.
import { CYLINDER_HEADER, cylinderRow } from "./cylinderRows.mjs";
import { labLogText } from "./labLogText.mjs";
import { notebookText } from "./notebookText.mjs";
import { loadNote, percentile, startServer, verdict } from "./lspBenchClient.mjs";

const AIMS = { hoverDuringAnalysisMs: 50, peakMb: 300 };
const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

{
  const { text, mentions } = notebookText(420_000);
  const server = await startServer("pull");
  const uri = "file:///kestrel-ridge/notebook/all-runs.md";
  await server.open(uri, "markdown", 1, text);
  const analysisStart = performance.now();
  const diagnostics = server.diagnostics(uri, 1);
  // Hover while the analysis runs: well into it, on a species near the end.
  await sleep(150);
  const target = mentions[mentions.length - 10];
  const hoverStart = performance.now();
  const hover = await server.hover(uri, { line: target.line, character: target.character + 1 });
  const hoverMs = performance.now() - hoverStart;
  await diagnostics;
  const analysisMs = performance.now() - analysisStart;
  // After an edit at the top, the same again.
  await server.replaceLine(uri, 2, 2, 0, "Noted: ");
  const editedDiagnostics = server.diagnostics(uri, 2);
  await sleep(50);
  const editedStart = performance.now();
  await server.hover(uri, { line: target.line, character: target.character + 1 });
  const editedHoverMs = performance.now() - editedStart;
  await editedDiagnostics;
  // Ten more one-line edits spread through the notebook, each to its diagnostics.
  const editTimes = [];
  const lineCount = text.split("\n").length;
  for (let edit = 0; edit < 10; edit++) {
    const line = Math.floor(((edit + 1) * lineCount) / 12);
    const start = performance.now();
    await server.replaceLine(uri, 3 + edit, line, 0, "Checked: ");
    await server.diagnostics(uri, 3 + edit);
    editTimes.push(performance.now() - start);
  }
  const peak = server.peakMegabytes();
  console.log(`editor, ${(text.length / 1e6).toFixed(1)} MB notebook over stdio (pull diagnostics); ${loadNote()}`);
  console.log(`  open to diagnostics           ${analysisMs.toFixed(0)} ms`);
  console.log(
    `  one-line edit to diagnostics  median ${percentile(editTimes, 0.5).toFixed(0)} ms, slowest ${Math.max(...editTimes).toFixed(0)} ms over 10 edits`,
  );
  console.log(`  server peak memory            ${peak.toFixed(0)} MB   aim < ${AIMS.peakMb} MB   ${verdict(peak < AIMS.peakMb)}`);
  console.log(
    `  hover during analysis         ${hoverMs.toFixed(1)} ms after opening, ${editedHoverMs.toFixed(1)} ms after an edit   aim < ${AIMS.hoverDuringAnalysisMs} ms   ${verdict(Math.max(hoverMs, editedHoverMs) < AIMS.hoverDuringAnalysisMs)}${hover ? "" : " (no hover came back)"}`,
  );
  await server.stop();
}

{
  const { text, lines } = labLogText(180_000);
  const server = await startServer("pull");
  const uri = "file:///kestrel-ridge/logs/gas-store-all-shifts.txt";
  const openStart = performance.now();
  await server.open(uri, "plaintext", 1, text);
  await server.diagnostics(uri, 1);
  const openMs = performance.now() - openStart;
  // Ten one-line edits spread through the log, each to its diagnostics.
  const editTimes = [];
  for (let edit = 0; edit < 10; edit++) {
    const line = Math.floor(((edit + 1) * lines.length) / 12);
    const start = performance.now();
    await server.replaceLine(uri, 2 + edit, line, 0, "Checked: ");
    await server.diagnostics(uri, 2 + edit);
    editTimes.push(performance.now() - start);
  }
  const peak = server.peakMegabytes();
  console.log(`editor, ${(text.length / 1e6).toFixed(1)} MB plain-text lab log over stdio (pull diagnostics); ${loadNote()}`);
  console.log(`  open to diagnostics           ${openMs.toFixed(0)} ms`);
  console.log(
    `  one-line edit to diagnostics  median ${percentile(editTimes, 0.5).toFixed(0)} ms, slowest ${Math.max(...editTimes).toFixed(0)} ms over 10 edits`,
  );
  console.log(`  server peak memory            ${peak.toFixed(0)} MB   aim < ${AIMS.peakMb} MB   ${verdict(peak < AIMS.peakMb)}`);
  await server.stop();
}

{
  const lines = [CYLINDER_HEADER];
  let length = CYLINDER_HEADER.length;
  for (let index = 0; length < 50_000_000; index++) {
    const row = cylinderRow(index);
    lines.push(row);
    length += row.length + 1;
  }
  const text = `${lines.join("\n")}\n`;
  lines.length = 0;
  const server = await startServer("pull");
  const uri = "file:///kestrel-ridge/inventory/cylinders-archive.csv";
  let version = 1;
  await server.open(uri, "csv", version, text);
  await server.diagnostics(uri, version);
  const rows = text.split("\n").length - 2;
  for (let edit = 0; edit < 10; edit++) {
    const index = Math.floor(((edit + 1) * rows) / 11);
    version += 1;
    await server.replaceLine(uri, version, index + 1, cylinderRow(index).length, cylinderRow(index, true));
    await server.diagnostics(uri, version);
  }
  const peak = server.peakMegabytes();
  console.log(`editor, ${(text.length / 1e6).toFixed(0)} MB CSV over stdio (pull diagnostics), 10 edits; ${loadNote()}`);
  console.log(`  server peak memory            ${peak.toFixed(0)} MB   aim < ${AIMS.peakMb} MB   ${verdict(peak < AIMS.peakMb)}`);
  await server.stop();
}
process.exit(0);
