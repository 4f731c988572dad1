// Minimal typings for the parts of jstat that basinquota uses (jstat ships none).
declare module 'jstat' {
  interface Dist2 {
    cdf(x: number, a: number): number;
    inv(p: number, a: number): number;
  }
  interface Dist3 {
    cdf(x: number, a: number, b: number): number;
    inv(p: number, a: number, b: number): number;
  }
  export const jStat: {
    studentt: Dist2;
    centralF: Dist3;
    normal: Dist3;
    chisquare: Dist2;
    noncentralt: { cdf(x: number, dof: number, ncp: number): number };
  };
  const _default: { jStat: typeof jStat } & typeof jStat;
  export default _default;
}
