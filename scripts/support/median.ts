/** The middle value of a set of timings (the upper middle for an even count). */
export const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
