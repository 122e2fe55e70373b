/**
 * The 3D page's copy of the one ball-and-stick renderer, bundled for the browser and published
 * on `globalThis.lonepairShapeScene` for the page script. It carries drawing code only: the view
 * model it draws comes from the language server.
 */
import { NEUTRAL_THEME, sceneSvg, shapeScene } from "../../shared/src/report/shapeScene";

(globalThis as unknown as { lonepairShapeScene: unknown }).lonepairShapeScene = Object.freeze({ shapeScene, sceneSvg, NEUTRAL_THEME });
