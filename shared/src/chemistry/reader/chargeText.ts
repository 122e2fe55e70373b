/** Canonical charge suffix: "" for 0, "^+", "^-", "^2-", "^3+". */
export function chargeText(charge: number): string {
  if (charge === 0) return "";
  const sign = charge > 0 ? "+" : "-";
  const magnitude = Math.abs(charge);
  return magnitude === 1 ? `^${sign}` : `^${magnitude}${sign}`;
}
