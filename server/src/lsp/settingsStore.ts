/**
 * Where features get their settings: asked of the client per document with
 * `workspace/configuration` when it supports that, otherwise the pushed or initial values,
 * otherwise the defaults.
 */
import type { Connection } from "vscode-languageserver";
import type { ServerLog } from "./guardedHandler";
import { describeError } from "./guardedHandler";
import { DEFAULT_SETTINGS, isRecord, settingsFrom, type ServerSettings } from "./settings";

export interface SettingsStore {
  /** Settings for one document. Never rejects. */
  forUri(uri: string): Promise<ServerSettings>;
  /** Forgets cached answers; `pushed` is the `settings` of a didChangeConfiguration, if any. */
  changed(pushed: unknown): void;
  /** Drops what was cached for a closed document. */
  forget(uri: string): void;
  /** Grows on every change, so results built from older settings can be told apart. */
  readonly generation: number;
}

/** A client that never answers must not hold a feature up for long. */
const CONFIGURATION_TIMEOUT_MS = 3000;

export function createSettingsStore(connection: Connection, canAskClient: () => boolean, log: ServerLog): SettingsStore {
  let global: ServerSettings = DEFAULT_SETTINGS;
  let generation = 0;
  const perUri = new Map<string, Promise<ServerSettings>>();

  const ask = async (uri: string): Promise<ServerSettings> => {
    try {
      const answer = await withTimeout(
        connection.workspace.getConfiguration({ scopeUri: uri, section: "lonepair" }),
        CONFIGURATION_TIMEOUT_MS,
      );
      return answer === undefined ? global : settingsFrom(answer);
    } catch (error) {
      log.error(`lonepair: reading settings failed, using defaults: ${describeError(error)}`);
      return global;
    }
  };

  return {
    forUri(uri) {
      if (!canAskClient()) return Promise.resolve(global);
      let pending = perUri.get(uri);
      if (!pending) {
        pending = ask(uri);
        perUri.set(uri, pending);
      }
      return pending;
    },
    changed(pushed) {
      generation += 1;
      perUri.clear();
      const section = isRecord(pushed) ? pushed.lonepair : undefined;
      if (section !== undefined) global = settingsFrom(section);
    },
    forget(uri) {
      perUri.delete(uri);
    },
    get generation() {
      return generation;
    },
  };
}

/** Resolves `undefined` when `promise` takes longer than `milliseconds`. */
function withTimeout<T>(promise: Promise<T>, milliseconds: number): Promise<T | undefined> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => resolve(undefined), milliseconds);
    promise.then(
      (value) => {
        clearTimeout(timer);
        resolve(value);
      },
      (error: unknown) => {
        clearTimeout(timer);
        reject(error);
      },
    );
  });
}
