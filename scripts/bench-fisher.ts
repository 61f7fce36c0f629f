import { fisherExactTwoSided } from '../shared/stats/fisher';

// Timing of the exact test on a register of ~300 000 jars: printed, never asserted (the test suite
// checks values; how fast a busy machine runs them is not a test's business).
const calls = 200;
fisherExactTwoSided(300, 9700, 9000, 281000);
const start = performance.now();
for (let i = 0; i < calls; i++) fisherExactTwoSided(300 + (i % 50), 9700, 9000, 281000);
const perCall = (performance.now() - start) / calls;
console.log(`fisherExactTwoSided, 2×2 tables over 300 000 jars: ${perCall.toFixed(3)} ms per call (${calls} calls)`);
