import { isIP } from 'node:net';

/**
 * Which peers may tell the API the client's address in `X-Forwarded-For` (Express's `trust proxy`):
 * `false` (nobody; the default, for an API that listens directly), a hop count behind the API, or a
 * list of proxy addresses, CIDR ranges and Express's names for ranges.
 */
export type TrustProxySetting = false | number | string[];

const RANGE_NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);
const MAX_HOPS = 10;

/** Why one entry of TRUST_PROXY is not usable, or undefined when it is. */
function entryProblem(entry: string): string | undefined {
  if (RANGE_NAMES.has(entry)) return undefined;
  const slash = entry.indexOf('/');
  const address = slash === -1 ? entry : entry.slice(0, slash);
  const family = isIP(address);
  if (family === 0) return `"${entry}" is not an IP address, a CIDR range or one of ${[...RANGE_NAMES].join(', ')}`;
  if (slash === -1) return undefined;
  const prefix = entry.slice(slash + 1);
  const maxPrefix = family === 4 ? 32 : 128;
  if (!/^\d{1,3}$/.test(prefix) || Number(prefix) > maxPrefix) {
    return `"${entry}" has a prefix length outside 0–${maxPrefix}`;
  }
  return undefined;
}

/** Why the whole TRUST_PROXY value is not usable, or undefined when it is (unset or empty means trust nobody). */
export function trustProxyProblem(raw: string | undefined): string | undefined {
  const value = (raw ?? '').trim();
  if (value === '') return undefined;
  if (/^\d+$/.test(value)) {
    return Number(value) <= MAX_HOPS ? undefined : `a hop count must be 0 to ${MAX_HOPS}`;
  }
  if (value === 'true' || value === '*') {
    return 'trusting every peer lets any client choose its own address; give the proxies\' addresses or a hop count';
  }
  const entries = value.split(',').map((entry) => entry.trim());
  if (entries.some((entry) => entry === '')) return 'an entry of the list is empty';
  for (const entry of entries) {
    const problem = entryProblem(entry);
    if (problem) return problem;
  }
  return undefined;
}

/** Turns a TRUST_PROXY value already checked by `trustProxyProblem` into Express's setting. */
export function parseTrustProxy(raw: string | undefined): TrustProxySetting {
  const value = (raw ?? '').trim();
  if (value === '') return false;
  if (/^\d+$/.test(value)) return Number(value) === 0 ? false : Number(value);
  return value.split(',').map((entry) => entry.trim());
}
