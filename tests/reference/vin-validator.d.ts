// The independent check-digit library used only to cross-check shared/vin.ts; it ships no types.
declare module 'vin-validator' {
  const vinValidator: { validate(vin: string): boolean };
  export default vinValidator;
}
