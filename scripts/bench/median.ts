/** The middle value of a benchmark's samples (the upper of the two middle ones for an even count). */
export const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number
