/** The forecast chart's colours, from the app palette in src/index.css; the legend says each in words. */
export const FORECAST_COLOURS = {
  projected: '#1d2b36', // ink
  projectedFill: '#7fa7c9', // pale slate blue, the spend chart's second tone
  reorderPoint: '#8a5a00', // brass deep
  safetyStock: '#a2281b', // bad red
  receipt: '#1f6f43', // ok green
  grid: '#d6d2c8', // rule
  axis: '#3c4d5a', // ink soft
  zero: '#6b7d8a', // steel
} as const;
