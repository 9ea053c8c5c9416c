/**
 * Server and browser suites run against the PostgreSQL cluster and built app
 * that `npm test` (scripts/test.ts) starts; running them bare cannot work.
 */
export default function setup(): void {
  if (!process.env.PORTWRIGHT_TEST_URL || !process.env.PORTWRIGHT_TEST_DATABASE_URL) {
    throw new Error('Run server and browser tests through `npm test -- <file or filter>`: it starts their database and app server.')
  }
}
