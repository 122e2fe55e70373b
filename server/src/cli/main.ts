/**
 * Entry point of `dist/cli.js`: wires `runCli` to the process (arguments, streams, exit code).
 */
import { runCli } from "./runCli";
import { shouldUseColour } from "./terminalStyle";

/**
 * Output to `stream` that stops quietly once the reader has gone: `lonepair check . | head -1`
 * closes the pipe early, which is not an error. The command still runs to the end without
 * writing, so that its exit status is its own (a check with errors fails under `pipefail`).
 */
function outputTo(stream: NodeJS.WriteStream): { write: (text: string) => void; drained: () => Promise<void> } {
  let closed = false;
  stream.on("error", (error: NodeJS.ErrnoException) => {
    if (error.code !== "EPIPE") throw error;
    closed = true;
  });
  return {
    write(text) {
      if (!closed) stream.write(text);
    },
    async drained() {
      // After a closed pipe the stream still says it needs draining, and never drains.
      if (closed || !stream.writableNeedDrain) return;
      await new Promise<void>((resolve) => {
        // A pipe does not keep Node running by itself: without this the process would end
        // here, with status 0, instead of hearing that the reader has gone.
        const keepRunning = setInterval(() => undefined, 1 << 30);
        const done = (): void => {
          clearInterval(keepRunning);
          for (const event of ["drain", "close", "error"]) stream.off(event, done);
          resolve();
        };
        for (const event of ["drain", "close", "error"]) stream.on(event, done);
      });
    },
  };
}

const stdout = outputTo(process.stdout);
const stderr = outputTo(process.stderr);
const io = {
  writeOut: stdout.write,
  writeError: stderr.write,
  outputDrained: stdout.drained,
  colour: shouldUseColour(process.stdout.isTTY === true, process.env),
};

// Setting exitCode (rather than calling exit) lets piped output flush completely.
void runCli(process.argv.slice(2), io).then((code) => {
  process.exitCode = code;
});
