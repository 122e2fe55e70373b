/**
 * Parses XML with `sax` in strict mode, a general-purpose parser that knows nothing of SVG or of
 * lonepair: it throws on any markup that is not well-formed XML. Returns every element in
 * document order with its attributes and the text directly inside it.
 */
import { createRequire } from "node:module";

/** One parsed element. */
export interface XmlElement {
  readonly name: string;
  readonly attributes: Readonly<Record<string, string>>;
  text: string;
}

interface SaxTag {
  readonly name: string;
  readonly attributes: Record<string, string>;
}

interface SaxParser {
  onerror: (error: Error) => void;
  onopentag: (tag: SaxTag) => void;
  onclosetag: () => void;
  ontext: (text: string) => void;
  write(text: string): SaxParser;
  close(): SaxParser;
}

const sax = createRequire(import.meta.url)("sax") as { parser(strict: boolean): SaxParser };

/** The elements of an XML document, or an exception naming what is not well-formed. */
export function parseXml(text: string): XmlElement[] {
  const elements: XmlElement[] = [];
  const open: XmlElement[] = [];
  const parser = sax.parser(true);
  parser.onerror = (error) => {
    throw error;
  };
  parser.onopentag = (tag) => {
    const element: XmlElement = { name: tag.name, attributes: { ...tag.attributes }, text: "" };
    elements.push(element);
    open.push(element);
  };
  parser.onclosetag = () => {
    open.pop();
  };
  parser.ontext = (chunk) => {
    if (open.length > 0) open[open.length - 1].text += chunk;
  };
  parser.write(text).close();
  return elements;
}
