/** Numbers in explanations: British grouping, at most `digits` decimals, no trailing zeros. */
export function fmt(value: number, digits = 1): string {
  return value.toLocaleString("en-GB", { maximumFractionDigits: digits });
}
