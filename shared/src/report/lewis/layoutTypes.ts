/** A point of a diagram layout, in bond lengths, y pointing up. */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/** Where each atom of a Lewis diagram goes. */
export interface DiagramLayout {
  /** One point per graph atom; bonds are about one unit long. */
  readonly positions: readonly Point[];
  /**
   * Directions (degrees) for an atom's lone pairs and odd electron where the layout fixes them
   * (the centre of a one-centre species); elsewhere they go in the free directions.
   */
  readonly loneAngles?: readonly (readonly number[] | undefined)[];
}
