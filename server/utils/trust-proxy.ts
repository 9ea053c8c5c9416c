/** Whether X-Forwarded-* headers come from a trusted reverse proxy (PORTWRIGHT_TRUST_PROXY=1). */
export function trustProxy(): boolean {
  return process.env.PORTWRIGHT_TRUST_PROXY === '1'
}
