import type { BlockModel } from '../types'
import { attenuatorModel } from './attenuator'
import { coupledModel } from './coupled'
import { coupledMicrostripModel } from './coupled-microstrip'
import { dataModel } from './data'
import { dividerModel } from './divider'
import { hybrid180Model } from './hybrid180'
import { hybrid90Model } from './hybrid90'
import { lineModel } from './line'
import { loadModel } from './load'
import { microstripModel } from './microstrip'
import { microstripBendModel } from './microstrip-bend'
import { microstripOpenModel } from './microstrip-open'
import { microstripStepModel } from './microstrip-step'
import { microstripTeeModel } from './microstrip-tee'
import { phaseModel } from './phase'
import { portModel } from './port'
import { seriesModel } from './series'
import { stubModel } from './stub'
import { subnetworkModel } from './subnetwork'

/** Every block type this version solves, by type name. Adding a type: one file and one line here. */
export const BLOCK_MODELS: Readonly<Record<string, BlockModel>> = Object.fromEntries(
  [
    portModel,
    lineModel,
    stubModel,
    loadModel,
    seriesModel,
    hybrid90Model,
    coupledModel,
    hybrid180Model,
    dividerModel,
    phaseModel,
    attenuatorModel,
    subnetworkModel,
    dataModel,
    microstripModel,
    microstripOpenModel,
    microstripStepModel,
    microstripBendModel,
    microstripTeeModel,
    coupledMicrostripModel,
  ].map(model => [model.type, model]),
)

/** Types named by the contract whose models come in a later version; documents using them get a clear problem. */
export const LATER_BLOCK_TYPES: ReadonlySet<string> = new Set<string>()
