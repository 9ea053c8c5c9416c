import { MU0 } from './constants'

/** Surface resistance of a good conductor, Ω per square: Rs = √(ωµ0/(2σ)) (Pozar, Microwave Engineering, 4th ed., eq. 1.131 [memory]). */
export function surfaceResistance(frequency: number, conductivity: number): number {
  return Math.sqrt((Math.PI * frequency * MU0) / conductivity)
}
