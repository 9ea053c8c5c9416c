/** A planar substrate with everything in SI units (metres, S/m); absent metal data means an ideal conductor. */
export interface MicrostripSubstrate {
  /** Relative permittivity εr of the dielectric. */
  permittivity: number
  /** Dielectric height h between strip and ground, m. */
  height: number
  /** Strip thickness t, m (0 for a zero-thickness strip). */
  thickness: number
  /** Dielectric loss tangent tan δ. */
  lossTangent: number
  /** Conductor conductivity σ, S/m; undefined for a lossless conductor. */
  conductivity?: number
  /** RMS surface roughness Δ of the conductor, m (0 for smooth). */
  roughness: number
}
