// Figures for people: British grouping, a true minus sign, and no more precision than a reader can use.

const MINUS = "\u2212";

export type FigureOptions = { maxFractionDigits?: number };

/**
 * Four significant figures below 1,000 (enough to compare with a published limit), whole numbers above it; or a
 * fixed number of decimals when the row asks for one (minutes, seconds).
 */
export function formatFigure(value: number | null | undefined, options: FigureOptions = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const format: Intl.NumberFormatOptions =
    options.maxFractionDigits !== undefined
      ? { maximumFractionDigits: options.maxFractionDigits }
      : Math.abs(value) >= 1000
        ? { maximumFractionDigits: 0 }
        : { maximumSignificantDigits: 4 };
  const text = value.toLocaleString("en-GB", format);
  // "-0" can appear when a tiny negative value rounds away.
  return text === "-0" ? "0" : text.replace("-", MINUS);
}

/** A figure with its unit, separated by a non-breaking space so the two never wrap apart. */
export function withUnit(value: number | null | undefined, unit: string, options?: FigureOptions): string {
  const figure = formatFigure(value, options);
  if (figure === "—" || unit === "") return figure;
  return unit === "%" ? `${figure}%` : `${figure}\u00a0${unit}`;
}

/** A share from 0 to 1 as a percentage with at most one decimal. */
export function formatShare(share: number | null | undefined): string {
  if (share === null || share === undefined) return "—";
  return withUnit(share * 100, "%", { maxFractionDigits: 1 });
}

/** "1 : 2.9" for on : rest, the way the trade writes it. */
export function formatRatio(restPerOn: number | null | undefined): string {
  if (restPerOn === null || restPerOn === undefined) return "—";
  return `1\u00a0:\u00a0${formatFigure(restPerOn, { maxFractionDigits: 1 })}`;
}
