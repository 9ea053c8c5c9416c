import {
  absDependencies, acosDependencies, addDependencies, asinDependencies, atan2Dependencies, atanDependencies, cbrtDependencies,
  ceilDependencies, cosDependencies, coshDependencies, create, divideDependencies, eDependencies, equalDependencies, expDependencies,
  floorDependencies, formatDependencies, hypotDependencies, largerDependencies, largerEqDependencies, log10Dependencies,
  log2Dependencies, logDependencies, maxDependencies, minDependencies, modDependencies, multiplyDependencies, parseDependencies,
  piDependencies, powDependencies, roundDependencies, signDependencies, sinDependencies, sinhDependencies, smallerDependencies,
  smallerEqDependencies, sqrtDependencies, subtractDependencies, tanDependencies, tanhDependencies, unaryMinusDependencies,
  unaryPlusDependencies, unequalDependencies, unitDependencies, type FactoryFunctionMap,
} from 'mathjs'

/**
 * The one maths instance for document values, built from mathjs's factories for only what values may use
 * (which also keeps the rest of mathjs out of the browser bundle). Nothing outside this module holds it, and
 * the allow-list in `expression-allow-list.ts` lets no expression call anything that could change it.
 */
export const valueMath = create({
  absDependencies, acosDependencies, addDependencies, asinDependencies, atan2Dependencies, atanDependencies, cbrtDependencies,
  ceilDependencies, cosDependencies, coshDependencies, divideDependencies, eDependencies, equalDependencies, expDependencies,
  floorDependencies, formatDependencies, hypotDependencies, largerDependencies, largerEqDependencies, log10Dependencies,
  log2Dependencies, logDependencies, maxDependencies, minDependencies, modDependencies, multiplyDependencies, parseDependencies,
  piDependencies, powDependencies, roundDependencies, signDependencies, sinDependencies, sinhDependencies, smallerDependencies,
  smallerEqDependencies, sqrtDependencies, subtractDependencies, tanDependencies, tanhDependencies, unaryMinusDependencies,
  unaryPlusDependencies, unequalDependencies, unitDependencies,
} as unknown as FactoryFunctionMap)

const toNumber = (x: unknown, name: string): number => {
  if (typeof x !== 'number') throw new Error(`${name} takes a plain number of decibels or a plain ratio`)
  return x
}

// Our own names for the decibel conversions engineers type most: power and amplitude (voltage) ratios.
valueMath.import({
  ln: (x: number) => valueMath.log(x),
  fromDbPower: (db: unknown) => 10 ** (toNumber(db, 'fromDbPower') / 10),
  fromDbAmplitude: (db: unknown) => 10 ** (toNumber(db, 'fromDbAmplitude') / 20),
  toDbPower: (ratio: unknown) => 10 * Math.log10(toNumber(ratio, 'toDbPower')),
  toDbAmplitude: (ratio: unknown) => 20 * Math.log10(toNumber(ratio, 'toDbAmplitude')),
}, { override: false })

// Nobody may reconfigure or extend the instance after this point, not even code that reaches it by accident.
for (const name of ['config', 'import', 'createUnit'] as const) {
  Object.defineProperty(valueMath, name, {
    value: () => { throw new Error(`${name} is not available`) },
    writable: false,
    configurable: false,
  })
}
