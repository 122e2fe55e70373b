/**
 * Names of network solids of one element. They are read as the element's formula under their own
 * name, and never become the name of that formula: "C" stays a carbon atom, "diamond" is the solid.
 */
export const NETWORK_SOLID_NAMES: ReadonlyMap<string, string> = new Map([
  ["diamond", "C"],
  ["graphite", "C"],
]);
