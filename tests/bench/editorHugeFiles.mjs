// Benchmark of the language server on very large files, driven over stdio by a protocol client:
// hovers sent at moments through the analysis of a 10 MB notebook (after opening it and after
// an edit), each on a species whose card is not written yet,
// one-line edits to that notebook and its peak memory, the same for a 10 MB plain-text lab log,
// and the server's peak memory while a 50 MB cylinder CSV is opened and edited ten times.
// Prints the figures beside the aims and the machine's load.
import { CYLINDER_HEADER, cylinderRow } from "./cylinderRows.mjs";
import { labLogText } from "./labLogText.mjs";
import { notebookText } from "./notebookText.mjs";
import { loadNote, percentile, startServer, verdict } from "./lspBenchClient.mjs";

const AIMS = { hoverDuringAnalysisMs: 50, peakMb: 300 };
const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));
/** When hovers are sent, counted from the open (or edit) and its diagnostics request. */
const HOVER_MOMENTS_MS = [0, 50, 150, 300];

/** One mention of each species, the last first. */
function distinctMentionsFromEnd(mentions) {
  const seen = new Set();
  const chosen = [];
  for (let index = mentions.length - 1; index >= 0; index--) {
    if (seen.has(mentions[index].text)) continue;
    seen.add(mentions[index].text);
    chosen.push(mentions[index]);
  }
  return chosen;
}

{
  const { text, mentions } = notebookText(420_000);
  const server = await startServer("pull");
  const uri = "file:///kestrel-ridge/notebook/all-runs.md";
  // Hovers aimed at moments through the analysis, each on a species not hovered before (whose
  // card is not written yet), near the end of the notebook.
  const targets = distinctMentionsFromEnd(mentions);
  const hoverThrough = async (version) => {
    const diagnostics = server.diagnostics(uri, version);
    const start = performance.now();
    const times = [];
    let answered = true;
    for (const at of HOVER_MOMENTS_MS) {
      await sleep(Math.max(0, at - (performance.now() - start)));
      const target = targets.shift();
      const hoverStart = performance.now();
      const hover = await server.hover(uri, { line: target.line, character: target.character + 1 });
      times.push(performance.now() - hoverStart);
      answered &&= Boolean(hover);
    }
    await diagnostics;
    return { times, answered, analysisMs: performance.now() - start };
  };
  await server.open(uri, "markdown", 1, text);
  const opened = await hoverThrough(1);
  // After an edit at the top, the same again.
  await server.replaceLine(uri, 2, 2, 0, "Noted: ");
  const edited = await hoverThrough(2);
  const analysisMs = opened.analysisMs;
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
  const slowest = Math.max(...opened.times, ...edited.times);
  const listed = (times) => times.map((time) => time.toFixed(0)).join(" / ");
  console.log(
    `  hover during analysis         slowest ${slowest.toFixed(1)} ms   aim < ${AIMS.hoverDuringAnalysisMs} ms   ${verdict(slowest < AIMS.hoverDuringAnalysisMs)}${opened.answered && edited.answered ? "" : " (a hover came back empty)"}`,
  );
  console.log(
    `    sent ${HOVER_MOMENTS_MS.join(" / ")} ms into the analysis: ${listed(opened.times)} ms after opening, ${listed(edited.times)} ms after an edit`,
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
