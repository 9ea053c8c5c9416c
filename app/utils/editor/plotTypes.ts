/** One line on a frequency plot. */
export interface PlotSeries {
  label: string
  values: ArrayLike<number>
  colour: string
  dash?: readonly number[]
  /** 'y' left axis, 'y2' right axis. */
  scale?: 'y' | 'y2'
}
