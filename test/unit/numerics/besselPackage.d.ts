// Types for the test-only reference package `bessel` (SheetJS), which ships none.
declare module 'bessel' {
  export function besselj(x: number, order: number): number;
}
