// Path constants of the random streams a sweep draws from, as streamFor(seed, CONSTANT).
// They are negative on purpose: the engine's replicate i draws from streamFor(seed, i) with
// i ≥ 0, and point seeds come from streamFor(seed, POINT_SEED_STREAM, index), so a design or a
// bootstrap never shares a stream with a projection, whatever seed the caller reuses.

/** Latin hypercube: stratum permutations and positions inside strata. */
export const LATIN_HYPERCUBE_STREAM = -7001;
/** Sobol' design: the random linear scramble and digital shift of the Sobol' sequence. */
export const SOBOL_SCRAMBLE_STREAM = -7002;
/** Bootstrap resampling of the Sobol' index estimators. */
export const SOBOL_BOOTSTRAP_STREAM = -7003;
/** Seeds of the individual points of a sweep. */
export const POINT_SEED_STREAM = -7004;
