/**
 * Turns a mined amount (a JS number from the spoken-measurement extractor) into the decimal text a
 * measurement stores, and the resolution the speaker's digits imply: "fifteen thousandths" is
 * 0.015 in, read to 0.001 in. Numbers never reach exponent form here, so a reading round-trips.
 */
export function readingText(value: number): string {
  if (!Number.isFinite(value)) throw new Error(`not a finite reading: ${value}`);
  const plain = String(value);
  if (!/e/i.test(plain)) return plain;
  return value.toFixed(12).replace(/0+$/, '').replace(/\.$/, '');
}

export function resolutionOfDigits(valueText: string): string {
  const decimals = (valueText.split('.')[1] ?? '').length;
  return decimals === 0 ? '1' : `0.${'0'.repeat(decimals - 1)}1`;
}
