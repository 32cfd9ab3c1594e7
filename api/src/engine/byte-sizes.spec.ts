import { formatBytes } from './byte-sizes';

// Decimal (SI) prefixes, as file managers show sizes: common practice, not a standard table.
describe('formatBytes', () => {
  it('keeps whole bytes below a kilobyte', () => {
    expect(formatBytes(0)).toBe('0 bytes');
    expect(formatBytes(999)).toBe('999 bytes');
  });

  it('gives one decimal below 100 of a unit, none when whole or from 100 up', () => {
    expect(formatBytes(1_500_000)).toBe('1.5 MB');
    expect(formatBytes(20_000_000_000)).toBe('20 GB');
    expect(formatBytes(734_003_200)).toBe('734 MB');
  });

  it('stops at terabytes', () => {
    expect(formatBytes(5_000_000_000_000_000)).toBe('5000 TB');
  });
});
