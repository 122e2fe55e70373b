// Benchmark of the language server on large structured files, driven over stdio by a protocol
// client as an editor drives it (pull diagnostics): a 5 MB JSON list of reference records and a
// 1 MB YAML one (one wrong electron count in every 997 records), opened, then one-line edits that
// each make one more record wrong. Prints open-to-diagnostics time, the slowest of four hovers
// sent while the file just opened is read, and edit-to-diagnostics p50/p95 beside the aims and
// the machine's load. Both re-read only the records an edit touches. Then a keystroke that breaks
// a record: a hover and the code actions asked for while that text is read whole (on the worker
// thread), and the keystroke that mends it.
import { afterEdit, afterEditLine, loadNote, percentile, startServer, verdict } from "./lspBenchClient.mjs";

const EDITS = 20;
const AIMS = { openMs: 1000, editP95Ms: 50, peakMb: 300, hoverDuringReadMs: 50 };
/** When hovers are sent, counted from the open and its diagnostics request. */
const HOVER_MOMENTS_MS = [0, 50, 150, 300];
const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

// common practice: valence electron counts, lone pairs and shapes of these reference gases.
const SPECIES = [
  ["sulfur hexafluoride", "SF6", 48, 0, "octahedral"],
  ["nitrogen trifluoride", "NF3", 26, 1, "trigonal pyramidal"],
  ["ammonia", "NH3", 8, 1, "trigonal pyramidal"],
  ["xenon tetrafluoride", "XeF4", 36, 2, "square planar"],
];
const isSeeded = (index) => index % 997 === 5;

function jsonRecord(index, wrong = isSeeded(index)) {
  const [name, formula, electrons, lonePairs, shape] = SPECIES[index % SPECIES.length];
  return (
    `    {"id": "REF-${index}", "name": "${name}", "formula": "${formula}", "valence electrons": ${wrong ? electrons - 2 : electrons}, ` +
    `"lone pairs": ${lonePairs}, "molecular geometry": "${shape}", "shelf": "Kestrel Ridge reference shelf ${index % 50}"},`
  );
}

function yamlRecord(index, wrong = isSeeded(index)) {
  const [name, formula, electrons, lonePairs, shape] = SPECIES[index % SPECIES.length];
  return `  - {id: REF-${index}, name: ${name}, formula: ${formula}, valence electrons: ${wrong ? electrons - 2 : electrons}, lone pairs: ${lonePairs}, molecular geometry: ${shape}}`;
}

/** Lines of a document: `head` lines, then one record a line, then `tail` lines. */
function documentOf(size, head, record, tail) {
  const lines = [...head];
  let length = 0;
  let count = 0;
  while (length < size) {
    const line = record(count);
    lines.push(line);
    length += line.length + 1;
    count++;
  }
  return { lines: [...lines, ...tail], head: head.length, count };
}

const documents = [
  {
    label: "5 MB JSON reference records",
    languageId: "json",
    file: "reference-shelf.json",
    record: jsonRecord,
    // From "formula" to inside its value: `formula": "SF6`.
    formulaOffset: 12,
    ...documentOf(5_000_000, ['{"lab": "Kestrel Ridge Analytical", "records": ['], jsonRecord, ['    {"id": "end of shelf"}', "]}"]),
  },
  {
    label: "1 MB YAML reference records",
    languageId: "yaml",
    file: "reference-shelf.yaml",
    record: yamlRecord,
    // From "formula" to inside its value: `formula: SF6`.
    formulaOffset: 10,
    ...documentOf(1_000_000, ["lab: Kestrel Ridge Analytical", "records:"], yamlRecord, []),
  },
];

const errorsIn = (items) => items.filter((item) => item.severity === 1 || item.severity === 2).length;

// `node editorStructured.mjs json` runs one kind only.
const only = process.argv[2];
for (const document of documents.filter((candidate) => !only || candidate.languageId === only)) {
  const server = await startServer("pull");
  const uri = `file:///kestrel-ridge/reference/${document.file}`;
  const text = `${document.lines.join("\n")}\n`;
  let version = 1;
  const openStart = performance.now();
  await server.open(uri, document.languageId, version, text);
  const pending = server.diagnostics(uri, version);
  // Hovers on formulas far into the file while it is read, each on another record.
  const hoverTimes = [];
  let hoversAnswered = true;
  for (const [index, at] of HOVER_MOMENTS_MS.entries()) {
    await sleep(Math.max(0, at - (performance.now() - openStart)));
    const record = document.count - 1 - index * 97;
    const line = document.record(record);
    const hoverStart = performance.now();
    const hover = await server.hover(uri, { line: document.head + record, character: line.indexOf("formula") + document.formulaOffset });
    hoverTimes.push(performance.now() - hoverStart);
    hoversAnswered &&= Boolean(hover);
  }
  const opened = await pending;
  const openMs = performance.now() - openStart;
  const editTimes = [];
  const afterTimes = [];
  let last = opened;
  for (let edit = 0; edit < EDITS; edit++) {
    // Make a correct record far into the file wrong: its electron count drops by two.
    let index = Math.floor(((edit + 1) * document.count) / (EDITS + 1));
    if (isSeeded(index)) index += 1;
    const before = document.record(index);
    version += 1;
    const start = performance.now();
    await server.replaceLine(uri, version, document.head + index, before.length, document.record(index, true));
    last = await server.diagnostics(uri, version);
    editTimes.push(performance.now() - start);
    afterTimes.push(await afterEdit(server, uri, { line: document.head + index, character: 4 }));
  }
  // A keystroke that breaks one record (a quote or brace left open), then the one that mends it:
  // the broken text is read whole on the worker thread, the mended one from the text before the
  // break. Meanwhile a hover and the lightbulb's code actions are asked for, as an editor does.
  const brokenIndex = Math.floor(document.count / 3);
  const intact = document.record(brokenIndex);
  const broken = intact.replace("formula", document.languageId === "json" ? '"formula' : "{formula");
  const breakStart = performance.now();
  version += 1;
  await server.replaceLine(uri, version, document.head + brokenIndex, intact.length, broken);
  const brokenDiagnostics = server.diagnostics(uri, version);
  await sleep(20);
  const farRecord = document.record(document.count - 3);
  const brokenHoverStart = performance.now();
  const brokenHover = await server.hover(uri, {
    line: document.head + document.count - 3,
    character: farRecord.indexOf("formula") + document.formulaOffset,
  });
  const brokenHoverMs = performance.now() - brokenHoverStart;
  const brokenActionsStart = performance.now();
  await server.codeActions(uri, { line: document.head + brokenIndex, character: 4 });
  const brokenActionsMs = performance.now() - brokenActionsStart;
  await brokenDiagnostics;
  const breakMs = performance.now() - breakStart;
  const mendStart = performance.now();
  version += 1;
  await server.replaceLine(uri, version, document.head + brokenIndex, broken.length, intact);
  await server.diagnostics(uri, version);
  const mendMs = performance.now() - mendStart;
  const p95 = percentile(editTimes, 0.95);
  console.log(`editor, ${document.label} over stdio (pull diagnostics), ${text.length.toLocaleString("en")} characters; ${loadNote()}`);
  console.log(
    `  open to diagnostics        ${openMs.toFixed(0)} ms   aim < ${AIMS.openMs} ms   ${verdict(openMs < AIMS.openMs)}   (${errorsIn(opened)} errors reported)`,
  );
  const slowestHover = Math.max(...hoverTimes);
  console.log(
    `  hover while it is read     slowest ${slowestHover.toFixed(1)} ms (${hoverTimes.map((time) => time.toFixed(0)).join(" / ")})   aim < ${AIMS.hoverDuringReadMs} ms   ${verdict(slowestHover < AIMS.hoverDuringReadMs)}${hoversAnswered ? "" : " (a hover came back empty)"}`,
  );
  console.log(
    `  one-line edit to diagnostics  p50 ${percentile(editTimes, 0.5).toFixed(0)} ms  p95 ${p95.toFixed(0)} ms   aim p95 < ${AIMS.editP95Ms} ms   ${verdict(p95 < AIMS.editP95Ms)}`,
  );
  console.log(afterEditLine(afterTimes));
  console.log(
    `  a keystroke that breaks a record  ${breakMs.toFixed(0)} ms to diagnostics (read whole on the worker thread); the one that mends it  ${mendMs.toFixed(0)} ms`,
  );
  const slowestWhileBroken = Math.max(brokenHoverMs, brokenActionsMs);
  console.log(
    `  while the broken text is read  hover ${brokenHoverMs.toFixed(1)} ms, code actions ${brokenActionsMs.toFixed(1)} ms   aim < ${AIMS.hoverDuringReadMs} ms   ${verdict(slowestWhileBroken < AIMS.hoverDuringReadMs)}${brokenHover ? "" : " (the hover came back empty)"}`,
  );
  console.log(`  records made wrong by edits  ${errorsIn(last) - errorsIn(opened)} of ${EDITS} reported after the edits`);
  const peak = server.peakMegabytes();
  console.log(`  server peak memory         ${peak.toFixed(0)} MB   aim < ${AIMS.peakMb} MB   ${verdict(peak < AIMS.peakMb)}`);
  await server.stop();
}
process.exit(0);
