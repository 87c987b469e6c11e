// Type declaration for the parts of jStat (npm "jstat", MIT) used by analysis/stats.
declare module "jstat" {
  interface ContinuousDistribution2 {
    cdf(x: number, a: number, b: number): number;
    inv(p: number, a: number, b: number): number;
  }
  interface ContinuousDistribution1 {
    cdf(x: number, a: number): number;
    inv(p: number, a: number): number;
  }
  interface JStatStatic {
    centralF: ContinuousDistribution2;
    chisquare: ContinuousDistribution1;
    normal: ContinuousDistribution2;
    studentt: ContinuousDistribution1;
    gammaln(x: number): number;
  }
  const jStat: JStatStatic;
  export default jStat;
}
