/**
 * Entry point of the language server (bundled to dist/server.js). Speaks LSP over stdio
 * (`--stdio`), IPC or sockets, whichever the command line asks for.
 */
import { ProposedFeatures, createConnection } from "vscode-languageserver/node";
import { describeError } from "./guardedHandler";
import { startServer } from "./server";

const connection = createConnection(ProposedFeatures.all);

// A bug in one feature must cost one answer, not the editor's whole language server.
process.on("uncaughtException", (error) => connection.console.error(`lonepair: uncaught: ${describeError(error)}`));
process.on("unhandledRejection", (reason) => connection.console.error(`lonepair: unhandled: ${describeError(reason)}`));

startServer(connection);
