// Benchmark of the language server on a 2,000-line lab notebook, driven over stdio by a protocol
// client: one-line edits to updated diagnostics with pull and with push diagnostics, and hovers
// over 1,000 species mentions picked at random (the first hover on each species included); then
// the same one-line edits to a 2,000-line plain-text lab log.
// Prints the figures beside the aims and the machine's load.
import { labLogText } from "./labLogText.mjs";
import { notebookText } from "./notebookText.mjs";
import { afterEdit, afterEditLine, loadNote, percentile, startServer, verdict } from "./lspBenchClient.mjs";

const LINES = 2000;
const EDITS = 40;
const HOVERS = 1000;
const AIMS = { editP95Ms: 50, hoverP99Ms: 10 };
const { text, mentions, lines } = notebookText(LINES);

/** A small seeded generator (mulberry32), so runs pick the same edits and hovers. */
function seeded(seed) {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = Math.imul(state ^ (state >>> 15), state | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const proseLines = lines.map((line, index) => ({ line, index })).filter(({ line }) => line.startsWith("We compared"));

for (const mode of ["pull", "push"]) {
  const random = seeded(16);
  const server = await startServer(mode);
  const uri = `file:///kestrel-ridge/notebook/run-14-to-100-${mode}.md`;
  let version = 1;
  await server.open(uri, "markdown", version, text);
  await server.diagnostics(uri, version);
  const current = [...lines];
  const editTimes = [];
  const afterTimes = [];
  for (let edit = 0; edit < EDITS; edit++) {
    // Rewrite one prose line: a species swapped for another, sometimes for an impossible one.
    const { index } = proseLines[Math.floor(random() * proseLines.length)];
    const replacement = current[index].replace(/against \S+/, `against ${edit % 3 === 0 ? "CH5" : "SF4"}`);
    version += 1;
    const start = performance.now();
    await server.replaceLine(uri, version, index, current[index].length, replacement);
    await server.diagnostics(uri, version);
    editTimes.push(performance.now() - start);
    afterTimes.push(await afterEdit(server, uri, { line: index, character: 4 }));
    current[index] = replacement;
  }
  const p95 = percentile(editTimes, 0.95);
  console.log(`editor, ${LINES.toLocaleString("en")}-line notebook over stdio (${mode} diagnostics); ${loadNote()}`);
  console.log(
    `  one-line edit to diagnostics  p50 ${percentile(editTimes, 0.5).toFixed(1)} ms  p95 ${p95.toFixed(1)} ms   aim p95 < ${AIMS.editP95Ms} ms   ${verdict(p95 < AIMS.editP95Ms)}`,
  );
  console.log(afterEditLine(afterTimes));
  if (mode === "pull") {
    // Hovers on the text as the edits left it: mentions on edited lines are skipped.
    const edited = new Set(current.map((line, index) => (line !== lines[index] ? index : -1)));
    const targets = mentions.filter((mention) => !edited.has(mention.line));
    const seen = new Set();
    const all = [];
    const first = [];
    let answered = 0;
    for (let hover = 0; hover < HOVERS; hover++) {
      const mention = targets[Math.floor(random() * targets.length)];
      const start = performance.now();
      const result = await server.hover(uri, { line: mention.line, character: mention.character + 1 });
      const elapsed = performance.now() - start;
      if (result) answered++;
      all.push(elapsed);
      if (!seen.has(mention.text)) first.push(elapsed);
      seen.add(mention.text);
    }
    const p99 = percentile(all, 0.99);
    console.log(
      `  hover over ${HOVERS} random species, first hovers included   p50 ${percentile(all, 0.5).toFixed(1)} ms  p95 ${percentile(all, 0.95).toFixed(1)} ms  p99 ${p99.toFixed(1)} ms   aim p99 < ${AIMS.hoverP99Ms} ms   ${verdict(p99 < AIMS.hoverP99Ms)}`,
    );
    console.log(
      `  first hover on each of ${first.length} species  slowest ${Math.max(...first).toFixed(1)} ms, median ${percentile(first, 0.5).toFixed(1)} ms; ${answered} of ${HOVERS} hovers answered`,
    );
  }
  await server.stop();
}

{
  const log = labLogText(LINES);
  for (const mode of ["pull", "push"]) {
    const random = seeded(17);
    const server = await startServer(mode);
    const uri = `file:///kestrel-ridge/logs/gas-store-2026-${mode}.txt`;
    let version = 1;
    await server.open(uri, "plaintext", version, log.text);
    await server.diagnostics(uri, version);
    const current = [...log.lines];
    const editTimes = [];
    for (let edit = 0; edit < EDITS; edit++) {
      // Retype one timestamped entry: its first species swapped, sometimes for an impossible one.
      const index = log.entries[Math.floor(random() * log.entries.length)];
      const replacement = current[index].replace(/(\d\d:\d\d {2}\S+ \S+ )\S+/, `$1${edit % 3 === 0 ? "CH5" : "SF4"}`);
      version += 1;
      const start = performance.now();
      await server.replaceLine(uri, version, index, current[index].length, replacement);
      await server.diagnostics(uri, version);
      editTimes.push(performance.now() - start);
      current[index] = replacement;
    }
    const p95 = percentile(editTimes, 0.95);
    console.log(`editor, ${LINES.toLocaleString("en")}-line plain-text lab log over stdio (${mode} diagnostics); ${loadNote()}`);
    console.log(
      `  one-line edit to diagnostics  p50 ${percentile(editTimes, 0.5).toFixed(1)} ms  p95 ${p95.toFixed(1)} ms   aim p95 < ${AIMS.editP95Ms} ms   ${verdict(p95 < AIMS.editP95Ms)}`,
    );
    await server.stop();
  }
}
process.exit(0);
