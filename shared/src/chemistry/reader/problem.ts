import type { Problem, ProblemCode } from "../types";

/** A reading problem over `start..end` of the input, with an optional corrected spelling. */
export function problemAt(code: ProblemCode, message: string, start: number, end: number, suggestion?: string): Problem {
  const range = { start, end };
  return suggestion === undefined ? { code, message, range } : { code, message, range, suggestion };
}
