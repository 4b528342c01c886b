// jstat ships no types; these are the few functions the season tests use as outside references.
declare module 'jstat' {
  interface JStat {
    normal: {
      cdf(x: number, mean: number, sd: number): number;
      inv(p: number, mean: number, sd: number): number;
    };
    quantiles(values: number[], probabilities: number[], alphap?: number, betap?: number): number[];
  }
  const jstat: { jStat: JStat };
  export default jstat;
}
