// The few jStat functions the specs use as outside references (jstat ships no types).
declare module 'jstat' {
  export const jStat: {
    anovafscore(...groups: number[][]): number;
    percentile(values: number[], p: number): number;
    binomial: { cdf(k: number, n: number, p: number): number };
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    models: { ols(endog: number[], exog: number[][]): { coef: number[]; t: { se: number[] } } };
  };
}
