// A version number from a URL segment: a positive whole number, or null for anything else ("abc", "0", "1.5").
export function parseVersionParam(value: string): number | null {
  return /^[1-9]\d{0,5}$/.test(value) ? Number(value) : null;
}
