/**
 * Colour for the command line. The core only offers hooks (`CardStyle`); whether to colour is
 * decided here, once, from the terminal and the environment.
 */
import type { CardStyle } from "../../../shared/src/index";
import { PLAIN_CARD_STYLE } from "../../../shared/src/index";

/** True when stdout is a terminal and the user has not set NO_COLOR. */
export function shouldUseColour(stdoutIsTerminal: boolean, environment: NodeJS.ProcessEnv): boolean {
  return stdoutIsTerminal && environment.NO_COLOR === undefined;
}

const ansi =
  (open: number, close: number) =>
  (text: string): string =>
    `\u001b[${open}m${text}\u001b[${close}m`;

const COLOUR_CARD_STYLE: CardStyle = {
  title: ansi(1, 22),
  label: ansi(36, 39),
  error: ansi(31, 39),
  warning: ansi(33, 39),
  muted: ansi(2, 22),
};

/** The card style for this run. */
export function cardStyle(colour: boolean): CardStyle {
  return colour ? COLOUR_CARD_STYLE : PLAIN_CARD_STYLE;
}
