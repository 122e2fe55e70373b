// Benchmark of the language server on a large table, driven over stdio by a protocol client as an
// editor drives it, once with pull diagnostics and once with pushed ones: a 100,000-row cylinder
// CSV (one wrong electron count in every 997 rows) is opened and its diagnostics awaited, then
// one-line edits each make one more cell wrong and the new diagnostics are awaited. Prints
// open-to-diagnostics time, edit-to-diagnostics p50/p95, how many seeded errors were reported,
// and the server's peak memory, beside the aims and the machine's load.
import { CYLINDER_HEADER, cylinderRow, isSeededMistake } from "./cylinderRows.mjs";
import { afterEdit, afterEditLine, loadNote, percentile, startServer, verdict } from "./lspBenchClient.mjs";

const ROWS = 100_000;
const EDITS = 40;
const AIMS = { openMs: 1000, editP95Ms: 50, peakMb: 300 };

const lines = [CYLINDER_HEADER];
let seeded = 0;
for (let index = 0; index < ROWS; index++) {
  const wrong = isSeededMistake(index);
  if (wrong) seeded++;
  lines.push(cylinderRow(index, wrong));
}
const text = `${lines.join("\n")}\n`;
const errorsIn = (items) => items.filter((item) => item.severity === 1 || item.severity === 2).length;

for (const mode of ["pull", "push"]) {
  const server = await startServer(mode);
  const uri = `file:///kestrel-ridge/inventory/cylinders-100k-${mode}.csv`;
  let version = 1;
  const openStart = performance.now();
  await server.open(uri, "csv", version, text);
  const opened = await server.diagnostics(uri, version);
  const openMs = performance.now() - openStart;
  const reportedOnOpen = errorsIn(opened);

  const editTimes = [];
  const afterTimes = [];
  let last = opened;
  for (let edit = 0; edit < EDITS; edit++) {
    // Make a correct row far into the file wrong: its electron count drops by two.
    const index = Math.floor(((edit + 1) * ROWS) / (EDITS + 1));
    const before = cylinderRow(index);
    version += 1;
    const start = performance.now();
    await server.replaceLine(uri, version, index + 1, before.length, cylinderRow(index, true));
    last = await server.diagnostics(uri, version);
    editTimes.push(performance.now() - start);
    afterTimes.push(await afterEdit(server, uri, { line: index + 1, character: 4 }));
  }
  const p95 = percentile(editTimes, 0.95);
  const peak = server.peakMegabytes();
  console.log(`editor, 100,000-row CSV over stdio (${mode} diagnostics), ${text.length.toLocaleString("en")} characters; ${loadNote()}`);
  console.log(`  open to diagnostics        ${openMs.toFixed(0)} ms   aim < ${AIMS.openMs} ms   ${verdict(openMs < AIMS.openMs)}`);
  console.log(`  seeded wrong cells         ${reportedOnOpen} of ${seeded} reported on open   ${verdict(reportedOnOpen >= seeded)}`);
  console.log(
    `  one-line edit to diagnostics  p50 ${percentile(editTimes, 0.5).toFixed(0)} ms  p95 ${p95.toFixed(0)} ms   aim p95 < ${AIMS.editP95Ms} ms   ${verdict(p95 < AIMS.editP95Ms)}`,
  );
  console.log(afterEditLine(afterTimes));
  console.log(`  cells made wrong by edits  ${errorsIn(last) - reportedOnOpen} of ${EDITS} reported after the edits`);
  console.log(`  server peak memory         ${peak.toFixed(0)} MB   aim < ${AIMS.peakMb} MB   ${verdict(peak < AIMS.peakMb)}`);
  await server.stop();
}
process.exit(0);
