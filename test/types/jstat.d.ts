/** The few jStat 1.9.6 functions the tests use as an independent reference (the package ships no types). */
declare module 'jstat' {
  interface Distribution {
    cdf(x: number, ...parameters: number[]): number;
    inv(p: number, ...parameters: number[]): number;
  }
  interface JStatStatic {
    normal: Distribution;
    chisquare: Distribution;
    factorialln(n: number): number;
  }
  const jStat: JStatStatic;
  export default jStat;
}
