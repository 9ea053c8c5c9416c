/** Complex excitations of the array's elements in order, as separate real and imaginary parts. */
export interface ArrayWeights {
  re: Float64Array
  im: Float64Array
}

/** How the array is laid out and what its elements radiate. */
export interface ArrayGeometry {
  /** Element spacing in wavelengths. */
  spacing: number
  /** Element power pattern cosⁿθ (θ from broadside); 0 for isotropic elements. @default 0 */
  elementExponent?: number
}
