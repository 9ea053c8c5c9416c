/** Base URL of the app under test, as started by scripts/test.ts. */
export function appUrl(path = ''): string {
  const base = process.env.PORTWRIGHT_TEST_URL
  if (!base) throw new Error('PORTWRIGHT_TEST_URL is not set: run through `npm test`.')
  return base + path
}
