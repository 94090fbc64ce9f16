// convert-units 2 ships without types; the part Rowbench uses.
declare module 'convert-units' {
  interface Converter { from(unit: string): { to(unit: string): number } }
  export default function convert(value: number): Converter
}
