/**
 * `npx tsx scripts/write-examples.ts` writes shared/examples/*.json from shared/examples/index.ts,
 * so the command line and the bench run on the same documents the app imports.
 */
import { writeFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { EXAMPLES } from '../shared/examples/index'

const folder = fileURLToPath(new URL('../shared/examples/', import.meta.url))
for (const [name, document] of Object.entries(EXAMPLES)) {
  writeFileSync(`${folder}${name}.json`, `${JSON.stringify(document, null, 2)}\n`)
}
process.stdout.write(`wrote ${Object.keys(EXAMPLES).length} examples to ${folder}\n`)
