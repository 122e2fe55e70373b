/**
 * A clean JSON text read in one pass of the parser's visitor, keeping only what the record reader
 * needs: each object's keys with the value under each (scalars as written, lists of strings under
 * equation keys), the key an object sits under, and the bounds of the elements of the list of
 * records. A syntax tree of every value costs several times the pass itself and most of a large
 * file's memory.
 *
 * For clean JSON only (no syntax error, nesting well short of the parser's stack): there every
 * object holds properties, each with one key and one value, and the objects in the order they
 * open are the syntax tree's objects in the order the tree is walked. Anything else is undefined,
 * and the caller reads the text through the tree.
 */
import { visit } from "jsonc-parser/lib/esm/main.js";
import { JSON_PARSE_OPTIONS } from "./json";

/**
 * What a value is, as far as the record reader looks: a string, a number or boolean (read as
 * written), a list (its strings kept when it sits under an equation key), or anything else.
 */
export type ValueKind = "string" | "written" | "list" | "other";

/** One property of an object: its key and value (offsets of the whole value, quotes included). */
export interface OutlineProperty {
  readonly key: string;
  readonly kind: ValueKind;
  readonly offset: number;
  readonly length: number;
  /** A string's value. */
  readonly value?: string;
  /** A list's strings (value, offset, length), kept only under equation keys. */
  readonly strings?: readonly (readonly [string, number, number])[];
}

/** One object: its properties, and the key it sits under (when it is a property's value). */
export interface OutlineObject {
  readonly properties: OutlineProperty[];
  readonly under?: { readonly key: string; readonly offset: number; readonly length: number };
}

/** A clean JSON text's objects (in the order they open) and the bounds of its record list's elements. */
export interface JsonOutline {
  readonly objects: readonly OutlineObject[];
  /** The record list (the root list, or the longest list directly under the root object). */
  readonly list?: { readonly starts: Int32Array; readonly ends: Int32Array };
}

/** Deeper than this the tree's reading decides (it reports a document too deep for its stack). */
const DEEPEST = 1000;

/** Thrown to stop the pass at the first syntax error. */
const STOP = Symbol("stop");

interface Frame {
  readonly type: "object" | "array";
  readonly offset: number;
  readonly object?: OutlineObject;
  /** The key and its offsets while its value is awaited (objects only). */
  key?: { readonly name: string; readonly offset: number; readonly length: number };
  /** The property whose value this list is, when its strings are kept. */
  readonly strings?: [string, number, number][];
  /** The bounds of its elements, for the root list and lists directly under the root object. */
  readonly starts?: number[];
  readonly ends?: number[];
}

/**
 * The outline of `text`, or undefined when it is not clean JSON. `isEquationKey` says which keys'
 * lists of strings are kept.
 */
export function jsonOutline(text: string, isEquationKey: (key: string) => boolean): JsonOutline | undefined {
  const objects: OutlineObject[] = [];
  const stack: Frame[] = [];
  // Lists that may be the record list, with how many elements each holds, in document order.
  const candidates: Frame[] = [];
  let rootSeen = false;
  let rootIsObject = false;

  const top = (): Frame | undefined => stack[stack.length - 1];
  /** Records a value of `kind` that runs from `offset` for `length` in its parent. */
  const placed = (kind: ValueKind, offset: number, length: number, value?: unknown, strings?: [string, number, number][]): void => {
    const parent = top();
    if (!parent) return;
    if (parent.type === "object") {
      const key = parent.key;
      // Clean JSON has a key before every value in an object.
      if (!key) throw STOP;
      parent.object!.properties.push({
        key: key.name,
        kind,
        offset,
        length,
        value: typeof value === "string" ? value : undefined,
        strings,
      });
      parent.key = undefined;
    } else {
      if (parent.strings && typeof value === "string") parent.strings.push([value, offset, length]);
      if (parent.starts) {
        parent.starts.push(offset);
        parent.ends!.push(offset + length);
      }
    }
  };
  const open = (type: "object" | "array", offset: number): void => {
    if (stack.length >= DEEPEST) throw STOP;
    const parent = top();
    const atRoot = !parent;
    if (atRoot) {
      if (rootSeen) throw STOP;
      rootSeen = true;
      rootIsObject = type === "object";
    }
    if (type === "object") {
      const under = parent?.type === "object" && parent.key ? parent.key : undefined;
      const object: OutlineObject = { properties: [], under: under && { key: under.name, offset: under.offset, length: under.length } };
      objects.push(object);
      stack.push({ type, offset, object });
      return;
    }
    const keyed = parent?.type === "object" ? parent.key : undefined;
    const candidate = atRoot || (rootIsObject && stack.length === 1);
    const frame: Frame = {
      type,
      offset,
      strings: keyed && isEquationKey(keyed.name) ? [] : undefined,
      starts: candidate ? [] : undefined,
      ends: candidate ? [] : undefined,
    };
    if (candidate) candidates.push(frame);
    stack.push(frame);
  };
  const close = (offset: number, length: number): void => {
    const frame = stack.pop();
    if (!frame) throw STOP;
    const end = offset + length;
    placed(frame.type === "object" ? "other" : "list", frame.offset, end - frame.offset, undefined, frame.strings);
  };

  try {
    visit(
      text,
      {
        onObjectBegin: (offset) => open("object", offset),
        onObjectProperty: (name, offset, length) => {
          const frame = top();
          if (!frame || frame.type !== "object" || frame.key) throw STOP;
          frame.key = { name, offset, length };
        },
        onObjectEnd: (offset, length) => close(offset, length),
        onArrayBegin: (offset) => open("array", offset),
        onArrayEnd: (offset, length) => close(offset, length),
        onLiteralValue: (value: unknown, offset, length) => {
          if (!top()) {
            if (rootSeen) throw STOP;
            rootSeen = true;
            return;
          }
          const kind = typeof value === "string" ? "string" : typeof value === "number" || typeof value === "boolean" ? "written" : "other";
          placed(kind, offset, length, value);
        },
        onError: () => {
          throw STOP;
        },
      },
      JSON_PARSE_OPTIONS,
    );
  } catch {
    // A syntax error, nesting too deep, or the parser's own stack: the tree decides.
    return undefined;
  }
  if (stack.length > 0 || !rootSeen) return undefined;
  return { objects, list: recordList(candidates, rootIsObject) };
}

/**
 * The root list, or the list under the root object with the most elements (the first of equals);
 * never a list under an equation key, whose strings are read as equations only there.
 */
function recordList(candidates: readonly Frame[], rootIsObject: boolean): JsonOutline["list"] {
  let longest: Frame | undefined;
  for (const candidate of candidates) {
    if (candidate.strings) continue;
    if (!rootIsObject) return bounds(candidate);
    if (candidate.starts!.length > (longest?.starts!.length ?? 0)) longest = candidate;
  }
  return longest && bounds(longest);
}

function bounds(frame: Frame): JsonOutline["list"] {
  return { starts: Int32Array.from(frame.starts!), ends: Int32Array.from(frame.ends!) };
}
