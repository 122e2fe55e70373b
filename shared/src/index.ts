/**
 * The core's one facade: everything the server, the command line and the tests use.
 * Pure functions over strings and plain data; no editor, protocol or I/O.
 */
export * from "./chemistry/types";
export { ELEMENTS, elementBySymbol, elementByName } from "./chemistry/elements";
export { readSpecies } from "./chemistry/reader/readSpecies";
export { analyzeSpecies, analyzeReading } from "./chemistry/analyze";
