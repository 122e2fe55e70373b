/**
 * What the connected client says it can do, read once from `initialize`. Features consult
 * this instead of the raw capabilities so that a missing capability degrades one feature.
 */
import { MarkupKind, type ClientCapabilities } from "vscode-languageserver";
import type { HoverFormat } from "../../../shared/src/index";

export interface ClientFeatures {
  /** `workspace/configuration` can be asked for settings. */
  readonly configuration: boolean;
  /** Settings changes can be subscribed to with dynamic registration. */
  readonly configurationRegistration: boolean;
  /** The client pulls diagnostics (`textDocument/diagnostic`); otherwise we push them. */
  readonly pullDiagnostics: boolean;
  readonly diagnosticRefresh: boolean;
  /** The client tells of workspace folders added and removed. */
  readonly workspaceFolders: boolean;
  /** File watching can be registered dynamically (`workspace/didChangeWatchedFiles`). */
  readonly watchedFilesRegistration: boolean;
  readonly inlayHints: boolean;
  readonly inlayHintRefresh: boolean;
  /** Workspace edits may carry versioned document changes. */
  readonly documentChanges: boolean;
  /** Code actions may be returned as literals with edits (not only commands). */
  readonly codeActionLiterals: boolean;
  /** Code actions may leave out their edit and have it filled in by `codeAction/resolve`. */
  readonly codeActionResolveEdit: boolean;
  /** The client's preferred hover format among those we write; plain text when it names none. */
  readonly hoverFormat: HoverFormat;
}

/** Reads the capabilities the server cares about; anything absent counts as unsupported. */
export function clientFeaturesFrom(capabilities: ClientCapabilities): ClientFeatures {
  const workspace = capabilities.workspace;
  const textDocument = capabilities.textDocument;
  return {
    configuration: workspace?.configuration === true,
    configurationRegistration: workspace?.didChangeConfiguration?.dynamicRegistration === true,
    pullDiagnostics: isObject(textDocument?.diagnostic),
    diagnosticRefresh: workspace?.diagnostics?.refreshSupport === true,
    workspaceFolders: workspace?.workspaceFolders === true,
    watchedFilesRegistration: workspace?.didChangeWatchedFiles?.dynamicRegistration === true,
    inlayHints: isObject(textDocument?.inlayHint),
    inlayHintRefresh: workspace?.inlayHint?.refreshSupport === true,
    documentChanges: workspace?.workspaceEdit?.documentChanges === true,
    codeActionLiterals: isObject(textDocument?.codeAction?.codeActionLiteralSupport),
    codeActionResolveEdit:
      textDocument?.codeAction?.dataSupport === true && arrayIncludes(textDocument?.codeAction?.resolveSupport?.properties, "edit"),
    hoverFormat: preferredHoverFormat(textDocument?.hover?.contentFormat),
  };
}

/**
 * `contentFormat` lists the client's formats in order of preference. A client that lists none
 * gets plain text: markdown syntax shown raw is unreadable, plain text shown as markdown is not.
 */
function preferredHoverFormat(formats: unknown): HoverFormat {
  if (!Array.isArray(formats)) return MarkupKind.PlainText;
  const known = formats.find((format) => format === MarkupKind.Markdown || format === MarkupKind.PlainText) as HoverFormat | undefined;
  return known ?? MarkupKind.PlainText;
}

/** Clients send what they send: a missing or malformed list counts as empty. */
function arrayIncludes(list: unknown, value: string): boolean {
  return Array.isArray(list) && list.includes(value);
}

function isObject(value: unknown): boolean {
  return typeof value === "object" && value !== null;
}
