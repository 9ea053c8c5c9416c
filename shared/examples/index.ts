import type { NetworkDocument } from '../network/types'
import { branchLineHybrid } from './branch-line-hybrid'
import { branchLineTuning } from './branch-line-tuning'
import { butlerMatrix4x4 } from './butler-matrix-4x4'
import { lineChain } from './line-chain'
import { ringHybrid } from './ring-hybrid'
import { wilkinsonDivider } from './wilkinson-divider'

export { branchLineHybrid, branchLineTuning, butlerMatrix4x4, lineChain, ringHybrid, wilkinsonDivider }

/** Every shipped example by file name (without .json); the JSON files beside this one are written from it. */
export const EXAMPLES: Readonly<Record<string, NetworkDocument>> = {
  'branch-line-hybrid': branchLineHybrid,
  'ring-hybrid': ringHybrid,
  'wilkinson-divider': wilkinsonDivider,
  'butler-matrix-4x4': butlerMatrix4x4,
  'branch-line-tolerances': branchLineTuning(false),
  'branch-line-detuned': branchLineTuning(true),
  'line-chain-10': lineChain(10),
  'line-chain-100': lineChain(100),
  'line-chain-1000': lineChain(1000),
}
