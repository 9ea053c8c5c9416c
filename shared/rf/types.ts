/** A complex quantity over frequency, as separate real and imaginary arrays. */
export interface ComplexSeries {
  re: Float64Array
  im: Float64Array
}

/** S-parameters over frequency in the solver's layout: S(i+1)(j+1) at frequency k at (k·ports + i)·ports + j. */
export interface SParameterSet {
  ports: number
  frequencies: Float64Array
  re: Float64Array
  im: Float64Array
}
