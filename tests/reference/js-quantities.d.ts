// js-quantities ships no type declarations; this covers the little the cross-check uses.
declare module 'js-quantities' {
  interface Qty {
    scalar: number;
    to(unit: string): Qty;
  }
  function Qty(value: number, unit: string): Qty;
  function Qty(text: string): Qty;
  export default Qty;
}
