/** The readings check: units, standard atmosphere, vacuum, fuel trims, OBD-II decoding and verdicts. */
export * from './reading-kinds';
export * from './errors';
export * from './units';
export * from './atmosphere';
export * from './vacuum';
export * from './vacuum-causes';
export * from './vacuum-judgement';
export * from './fuel-trim';
export * from './fuel-trim-causes';
export * from './fuel-trim-judgement';
export * from './obd';
export * from './cautions';
export * from './verdict-labels';
export * from './judge-reading';
export * from './readings-check';
