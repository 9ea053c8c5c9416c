/** One line on a frequency plot. */
export interface PlotSeries {
  label: string
  values: ArrayLike<number | null>
  colour: string
  dash?: readonly number[]
  /** 'y' left axis, 'y2' right axis. */
  scale?: 'y' | 'y2'
}

/** A frequency band shaded on a plot (a review comment on a snapshot), in Hz. */
export interface PlotBand {
  id: string
  low: number
  high: number
  label: string
}

/** A band shaded between two curves over frequency (a trace's spread over a yield run). */
export interface PlotFill {
  label: string
  low: ArrayLike<number | null>
  high: ArrayLike<number | null>
  /** Fill colour, translucent. */
  colour: string
}
