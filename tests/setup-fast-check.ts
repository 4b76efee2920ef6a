// Property tests draw their random cases from one fixed seed, so a CI run is repeatable;
// set POLEBOOK_FC_SEED to explore other cases locally (a failure prints its seed and path).
import fc from 'fast-check';

fc.configureGlobal({ seed: Number(process.env.POLEBOOK_FC_SEED ?? 20261202) });
