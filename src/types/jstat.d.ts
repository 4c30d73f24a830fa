declare module 'jstat' {
  interface ContinuousDistribution {
    pdf(x: number, ...parameters: number[]): number;
    cdf(x: number, ...parameters: number[]): number;
    inv(probability: number, ...parameters: number[]): number;
  }
  interface JStatStatic {
    normal: ContinuousDistribution;
    chisquare: ContinuousDistribution;
    beta: ContinuousDistribution;
    gammaln(x: number): number;
    factorialln(n: number): number;
    combinationln?(n: number, k: number): number;
  }
  const jStat: JStatStatic;
  export default jStat;
}
