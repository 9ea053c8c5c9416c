/**
 * `npx tsx tests/unit/solver/golden/write-golden.ts` writes solver-golden.json: S of every golden
 * network as the solver gives it now. Run only when a deliberate change of results is reviewed.
 */
import { writeFileSync } from 'node:fs'
import { GOLDEN_NETWORKS } from './networks'
import { solveGolden } from './solve-golden'

const golden = Object.fromEntries(Object.entries(GOLDEN_NETWORKS).map(([name, network]) => [name, solveGolden(network)]))
writeFileSync(new URL('./solver-golden.json', import.meta.url), `${JSON.stringify(golden)}\n`)
process.stdout.write(`${Object.keys(golden).length} networks written\n`)
