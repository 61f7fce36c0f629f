declare module 'jstat' {
  const jStat: {
    normal: { inv(p: number, mean: number, sd: number): number };
    chisquare: { cdf(x: number, dof: number): number };
    erfc(x: number): number;
  };
  export default jStat;
}
