/**
 * Entry point of the language server (bundled to dist/server.js). With `--stdio` it reads
 * frames with a reader that survives garbage on the wire; IPC (`--node-ipc`, as the VS Code
 * client starts it), sockets and pipes use the library's own transports. Every transport reads
 * through the life-cycle gate, so requests before `initialize` or after `shutdown` are refused
 * the same way everywhere.
 */
import {
  IPCMessageReader,
  IPCMessageWriter,
  ProposedFeatures,
  StreamMessageWriter,
  createConnection,
  createServerPipeTransport,
  createServerSocketTransport,
  type Connection,
  type MessageReader,
  type MessageWriter,
} from "vscode-languageserver/node";
import { describeError } from "./guardedHandler";
import { gatedReader } from "./lifecycleGate";
import { createQuickRequestGate, watchedReader, watchedWriter, type QuickRequestGate } from "./quickRequests";
import { startServer } from "./server";
import { createTolerantReader } from "./tolerantReader";

type Transport = readonly [MessageReader, MessageWriter];

/** The transport named on the command line, as the library reads it; undefined when none is. */
function transportFromArguments(argv: readonly string[]): { readonly transport: Transport; readonly stdio: boolean } | undefined {
  for (let index = 0; index < argv.length; index += 1) {
    const [name, inlineValue] = argv[index].split("=", 2);
    const value = inlineValue ?? argv[index + 1];
    if (name === "--stdio")
      return { transport: [createTolerantReader(process.stdin), new StreamMessageWriter(process.stdout)], stdio: true };
    if (name === "--node-ipc") return { transport: [new IPCMessageReader(process), new IPCMessageWriter(process)], stdio: false };
    if (name === "--socket" && value !== undefined)
      return { transport: createServerSocketTransport(Number.parseInt(value, 10)), stdio: false };
    if (name === "--pipe" && value !== undefined) return { transport: createServerPipeTransport(value), stdio: false };
  }
  return undefined;
}

function stdioSetup(connection: Connection): void {
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
}

function openConnection(quickRequests: QuickRequestGate): Connection {
  const chosen = transportFromArguments(process.argv.slice(2));
  // Without a transport argument the library reports the usage error itself.
  if (!chosen) return createConnection(ProposedFeatures.all);
  const [reader, writer] = chosen.transport;
  // Long work gives way to the quick requests this sees come in, until it sees them answered.
  const watched = watchedWriter(writer, quickRequests);
  const connection = createConnection(ProposedFeatures.all, watchedReader(gatedReader(reader, watched), quickRequests), watched);
  if (chosen.stdio) stdioSetup(connection);
  return connection;
}

const quickRequests = createQuickRequestGate();
const connection = openConnection(quickRequests);

// A bug in one feature must cost one answer, not the editor's whole language server.
process.on("uncaughtException", (error) => connection.console.error(`lonepair: uncaught: ${describeError(error)}`));
process.on("unhandledRejection", (reason) => connection.console.error(`lonepair: unhandled: ${describeError(reason)}`));

startServer(connection, quickRequests);
