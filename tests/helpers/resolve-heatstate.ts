/** Prints where `heatstate` resolves for a script run as tests/examples.test.ts runs the examples. */
console.log(import.meta.resolve('heatstate'));
