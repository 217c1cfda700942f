// Tempo arithmetic from DESIGN.md: effective tempo at a playback rate is bpm × rate.

export const effectiveBpm = (bpm: number, rate: number): number => bpm * rate;
