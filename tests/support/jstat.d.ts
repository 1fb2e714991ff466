// Minimal types for the parts of jstat 1.9.6 the tests use (the package ships none).
// jstat's CommonJS build exports one object, which ESM imports as the default export.
declare module "jstat" {
  type Distribution = {
    cdf(x: number, mean: number, sd: number): number;
    pdf(x: number, mean: number, sd: number): number;
    inv(p: number, mean: number, sd: number): number;
  };
  const jStat: {
    normal: Distribution;
    mean(values: number[]): number;
    /** Sample standard deviation when `flag` is true (n − 1 in the denominator). */
    stdev(values: number[], flag?: boolean): number;
    erf(x: number): number;
  };
  export default jStat;
}
