import type { Problem, ProblemCode } from "../types";

/** A problem pointing at `start`..`end` of the SMILES text. */
export function smilesProblem(code: ProblemCode, message: string, start: number, end: number): Problem {
  return { code, message, range: { start, end } };
}

/** "character 3" for offset 2: positions in messages count from 1, as a reader would. */
export function position(offset: number): string {
  return `character ${offset + 1}`;
}
