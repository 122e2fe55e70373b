/**
 * Entry point of the language server (bundled to dist/server.js). With `--stdio` it reads
 * frames with a reader that survives garbage on the wire; IPC (`--node-ipc`, as the VS Code
 * client starts it), sockets and pipes go through the library's own transports.
 */
import { ProposedFeatures, StreamMessageWriter, createConnection, type Connection } from "vscode-languageserver/node";
import { describeError } from "./guardedHandler";
import { startServer } from "./server";
import { createTolerantReader } from "./tolerantReader";

function stdioConnection(): Connection {
  const connection = createConnection(ProposedFeatures.all, createTolerantReader(process.stdin), new StreamMessageWriter(process.stdout));
  let shutdownReceived = false;
  connection.onShutdown(() => {
    shutdownReceived = true;
  });
  // The library does these two for its own stdio streams; with our reader we do them here.
  const exitWhenInputEnds = (): never => process.exit(shutdownReceived ? 0 : 1);
  process.stdin.on("end", exitWhenInputEnds);
  process.stdin.on("close", exitWhenInputEnds);
  // Anything printed to stdout would corrupt the protocol stream.
  console.log = (...values: unknown[]) => connection.console.log(values.map(String).join(" "));
  console.info = (...values: unknown[]) => connection.console.info(values.map(String).join(" "));
  console.warn = (...values: unknown[]) => connection.console.warn(values.map(String).join(" "));
  console.error = (...values: unknown[]) => connection.console.error(values.map(String).join(" "));
  return connection;
}

const connection = process.argv.includes("--stdio") ? stdioConnection() : createConnection(ProposedFeatures.all);

// A bug in one feature must cost one answer, not the editor's whole language server.
process.on("uncaughtException", (error) => connection.console.error(`lonepair: uncaught: ${describeError(error)}`));
process.on("unhandledRejection", (reason) => connection.console.error(`lonepair: unhandled: ${describeError(reason)}`));

startServer(connection);
