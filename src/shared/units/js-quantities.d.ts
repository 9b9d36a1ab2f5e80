// js-quantities ships no types. Only the tests use it, as an outside reference
// for SI prefix arithmetic; this declares just the part they call.
declare module 'js-quantities' {
  interface Qty {
    readonly scalar: number;
    to(unit: string): Qty;
  }
  function Qty(source: string): Qty;
  export default Qty;
}
