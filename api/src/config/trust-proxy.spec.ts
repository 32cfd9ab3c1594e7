import { parseTrustProxy, trustProxyProblem } from './trust-proxy';

describe('TRUST_PROXY', () => {
  it('trusts nobody when unset, empty or 0', () => {
    expect(parseTrustProxy(undefined)).toBe(false);
    expect(parseTrustProxy('')).toBe(false);
    expect(parseTrustProxy(' 0 ')).toBe(false);
    expect(trustProxyProblem(undefined)).toBeUndefined();
  });

  it('reads a hop count', () => {
    expect(parseTrustProxy('2')).toBe(2);
    expect(trustProxyProblem('2')).toBeUndefined();
    expect(trustProxyProblem('11')).toMatch(/hop count/);
  });

  it('reads a list of addresses, CIDR ranges and Express range names', () => {
    const value = 'loopback, 10.0.0.0/8,192.168.1.7, fd00::/8, ::1';
    expect(trustProxyProblem(value)).toBeUndefined();
    expect(parseTrustProxy(value)).toEqual(['loopback', '10.0.0.0/8', '192.168.1.7', 'fd00::/8', '::1']);
  });

  it('names the entry it cannot use', () => {
    expect(trustProxyProblem('10.0.0.0/33')).toMatch(/"10\.0\.0\.0\/33" has a prefix length outside 0–32/);
    expect(trustProxyProblem('fd00::/129')).toMatch(/outside 0–128/);
    expect(trustProxyProblem('loopback,proxy.example')).toMatch(/"proxy\.example" is not an IP address/);
    expect(trustProxyProblem('10.0.0.1,,10.0.0.2')).toMatch(/empty/);
    expect(trustProxyProblem('10.0.0.0/x')).toMatch(/prefix length/);
  });

  it('refuses to trust every peer', () => {
    expect(trustProxyProblem('true')).toMatch(/any client choose its own address/);
    expect(trustProxyProblem('*')).toMatch(/any client/);
  });
});
