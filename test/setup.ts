import fc from 'fast-check';

// Property tests run with a fixed seed so CI is reproducible; set SKILLGATE_FC_SEED to explore
// other seeds locally (fast-check prints the seed and path of any counterexample).
const seed = Number(process.env.SKILLGATE_FC_SEED ?? 20261201);
fc.configureGlobal({ seed });
