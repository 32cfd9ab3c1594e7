/** A part number as parts are keyed and searched: upper case, letters and digits only ("hl-21 cpl" → "HL21CPL"). Pure. */
export function partNumberKey(partNumber: string): string {
  return partNumber.toUpperCase().replace(/[^A-Z0-9]/g, '');
}
