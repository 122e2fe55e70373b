// Random inputs for the reader benchmark: mostly formula-like noise (the text the reader meets
// while someone types), some arbitrary Unicode, and a few long strings.

const FORMULA_ALPHABET = "ABCDEFGHIKLMNOPRSTUVWXYZabcdefghiklmnoprstuy0123456789()[]{}+-^ .\\·";
const SNIPPETS = ["\\ce{", "}", "^2-", "^3+", "(OH)2", "H2O", "SO4", "Xe", "F4", "Cl", "sulfur ", "tetra", "fluoride"];

/** A small seeded generator so every run reads the same strings. */
export function seededRandom(seed) {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let mixed = state;
    mixed = Math.imul(mixed ^ (mixed >>> 15), mixed | 1);
    mixed ^= mixed + Math.imul(mixed ^ (mixed >>> 7), mixed | 61);
    return ((mixed ^ (mixed >>> 14)) >>> 0) / 4294967296;
  };
}

function pick(random, text) {
  return text[Math.floor(random() * text.length)];
}

function formulaNoise(random, length) {
  let text = "";
  while (text.length < length) {
    text += random() < 0.2 ? SNIPPETS[Math.floor(random() * SNIPPETS.length)] : pick(random, FORMULA_ALPHABET);
  }
  return text;
}

function unicodeNoise(random, length) {
  let text = "";
  for (let position = 0; position < length; position += 1) {
    text += String.fromCodePoint(Math.floor(random() * 0x3000));
  }
  return text;
}

/** `count` strings: 90% formula-like (1-40 chars), 9% Unicode (1-200), 1% long (1,000-5,000). */
export function randomStrings(count, seed = 14) {
  const random = seededRandom(seed);
  const strings = [];
  for (let index = 0; index < count; index += 1) {
    const roll = random();
    if (roll < 0.9) strings.push(formulaNoise(random, 1 + Math.floor(random() * 40)));
    else if (roll < 0.99) strings.push(unicodeNoise(random, 1 + Math.floor(random() * 200)));
    else strings.push(formulaNoise(random, 1000 + Math.floor(random() * 4000)));
  }
  return strings;
}
