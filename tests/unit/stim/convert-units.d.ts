// convert-units 2.3.4 ships no types; only the chain the tests use is declared.
declare module "convert-units" {
  interface Converter {
    from(unit: string): { to(unit: string): number };
  }
  export default function convert(value: number): Converter;
}
