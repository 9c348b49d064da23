/**
 * A "nice" tick step (1, 2 or 5 × a power of ten) giving at most `maxTicks` intervals over `span`, so a time axis
 * reads 0, 10, 20… rather than 0, 13.5, 27….
 */
export function niceStep(span: number, maxTicks = 8): number {
  if (!(span > 0) || !Number.isFinite(span)) return 1;
  const raw = span / maxTicks;
  const power = 10 ** Math.floor(Math.log10(raw));
  const multiple = [1, 2, 5, 10].find((m) => m * power >= raw) ?? 10;
  return multiple * power;
}

/** Tick values from 0 up to and including `span` (within rounding), `niceStep` apart. */
export function axisTicks(span: number, maxTicks = 8): number[] {
  if (!(span > 0) || !Number.isFinite(span)) return [0];
  const step = niceStep(span, maxTicks);
  const ticks: number[] = [];
  // Integer multiples, not repeated addition, so 0.1-steps do not drift (0.30000000000000004).
  for (let i = 0; i * step <= span * (1 + 1e-9); i += 1) ticks.push(Number((i * step).toPrecision(12)));
  return ticks;
}
