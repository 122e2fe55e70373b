/**
 * Entry point of `dist/cli.js`: wires `runCli` to the process (arguments, streams, exit code).
 */
import { runCli } from "./runCli";
import { shouldUseColour } from "./terminalStyle";

// A reader that stops early (`lonepair check . | head`) closes the pipe: that is not an error.
process.stdout.on("error", (error: NodeJS.ErrnoException) => {
  if (error.code === "EPIPE") process.exit(process.exitCode ?? 0);
  throw error;
});

const io = {
  writeOut: (text: string) => void process.stdout.write(text),
  writeError: (text: string) => void process.stderr.write(text),
  colour: shouldUseColour(process.stdout.isTTY === true, process.env),
};

// Setting exitCode (rather than calling exit) lets piped output flush completely.
void runCli(process.argv.slice(2), io).then((code) => {
  process.exitCode = code;
});
