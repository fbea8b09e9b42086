/** Turns TRUST_PROXY into the value Express's `trust proxy` setting expects. */

/**
 * `"true"` trusts every proxy, a number trusts that many hops (the usual choice behind one
 * reverse proxy: `1`), anything else is a comma-separated list of addresses, subnets or the
 * names `loopback`, `linklocal`, `uniquelocal`. Express itself would read `"1"` as an IP address.
 */
export function trustProxySetting(value: string): boolean | number | string {
  const trimmed = value.trim();
  if (trimmed === 'true') return true;
  if (trimmed === 'false') return false;
  if (/^\d+$/.test(trimmed)) return Number.parseInt(trimmed, 10);
  return trimmed;
}
