/* eslint-disable no-loss-of-precision -- constants copied verbatim from jStat; they parse to the same doubles */
// The parts of jStat 1.9.6 (npm "jstat", MIT licence, © jStat authors) that Brackline calls
// (analysis/stats/jstat.d.ts), copied statement for statement so every result is bit-identical.
// The dashboard build swaps "jstat" for this module (dashboard/vite.config.ts) because the published
// file is one undivided object (~17 kB gzip) that a bundler cannot trim; the command line and the
// tests use jstat as published, and tests/dashboard/build/jstatSubset.test.ts compares the two.
// Algorithms: log-gamma by Lanczos (Press et al. 2007, Numerical Recipes 3rd ed., §6.1);
// incomplete beta by continued fraction (§6.4) and its inverse (§6.4); regularised lower incomplete
// gamma by series / continued fraction (§6.2); erf by Chebyshev fit (§6.2.2) and its inverse.

function gammaln(x: number): number {
  let j = 0;
  const cof = [
    76.18009172947146, -86.50532032941677, 24.01409824083091, -1.231739572450155, 0.1208650973866179e-2,
    -0.5395239384953e-5,
  ];
  let ser = 1.000000000190015;
  let xx: number, y: number;
  let tmp = (y = xx = x) + 5.5;
  tmp -= (xx + 0.5) * Math.log(tmp);
  for (; j < 6; j++) ser += cof[j]! / ++y;
  return Math.log((2.5066282746310005 * ser) / xx) - tmp;
}

function lowRegGamma(a: number, x: number): number {
  const aln = gammaln(a);
  let ap = a;
  let sum = 1 / a;
  let del = sum;
  let b = x + 1 - a;
  let c = 1 / 1.0e-30;
  let d = 1 / b;
  let h = d;
  let i = 1;
  const ITMAX = -~(Math.log(a >= 1 ? a : 1 / a) * 8.5 + a * 0.4 + 17);
  let an: number;
  if (x < 0 || a <= 0) {
    return NaN;
  } else if (x < a + 1) {
    for (; i <= ITMAX; i++) {
      sum += del *= x / ++ap;
    }
    return sum * Math.exp(-x + a * Math.log(x) - aln);
  }
  for (; i <= ITMAX; i++) {
    an = -i * (i - a);
    b += 2;
    d = an * d + b;
    c = b + an / c;
    d = 1 / d;
    h *= d * c;
  }
  return 1 - h * Math.exp(-x + a * Math.log(x) - aln);
}

function betacf(x: number, a: number, b: number): number {
  const fpmin = 1e-30;
  let m = 1;
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  let m2: number, aa: number, del: number;
  if (Math.abs(d) < fpmin) d = fpmin;
  d = 1 / d;
  let h = d;
  for (; m <= 100; m++) {
    m2 = 2 * m;
    aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < fpmin) d = fpmin;
    c = 1 + aa / c;
    if (Math.abs(c) < fpmin) c = fpmin;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < fpmin) d = fpmin;
    c = 1 + aa / c;
    if (Math.abs(c) < fpmin) c = fpmin;
    d = 1 / d;
    del = d * c;
    h *= del;
    if (Math.abs(del - 1.0) < 3e-7) break;
  }
  return h;
}

/** Regularised incomplete beta I_x(a, b); jStat returns `false` outside [0, 1], kept as is. */
function ibeta(x: number, a: number, b: number): number {
  const bt =
    x === 0 || x === 1 ? 0 : Math.exp(gammaln(a + b) - gammaln(a) - gammaln(b) + a * Math.log(x) + b * Math.log(1 - x));
  if (x < 0 || x > 1) return false as unknown as number;
  if (x < (a + 1) / (a + b + 2)) return (bt * betacf(x, a, b)) / a;
  return 1 - (bt * betacf(1 - x, b, a)) / b;
}

function ibetainv(p: number, a: number, b: number): number {
  const EPS = 1e-8;
  const a1 = a - 1;
  const b1 = b - 1;
  let j = 0;
  let lna: number, lnb: number, pp: number, t: number, u: number, err: number, x: number;
  let al: number, h: number, w: number;
  if (p <= 0) return 0;
  if (p >= 1) return 1;
  if (a >= 1 && b >= 1) {
    pp = p < 0.5 ? p : 1 - p;
    t = Math.sqrt(-2 * Math.log(pp));
    x = (2.30753 + t * 0.27061) / (1 + t * (0.99229 + t * 0.04481)) - t;
    if (p < 0.5) x = -x;
    al = (x * x - 3) / 6;
    h = 2 / (1 / (2 * a - 1) + 1 / (2 * b - 1));
    w = (x * Math.sqrt(al + h)) / h - (1 / (2 * b - 1) - 1 / (2 * a - 1)) * (al + 5 / 6 - 2 / (3 * h));
    x = a / (a + b * Math.exp(2 * w));
  } else {
    lna = Math.log(a / (a + b));
    lnb = Math.log(b / (a + b));
    t = Math.exp(a * lna) / a;
    u = Math.exp(b * lnb) / b;
    w = t + u;
    if (p < t / w) x = Math.pow(a * w * p, 1 / a);
    else x = 1 - Math.pow(b * w * (1 - p), 1 / b);
  }
  const afac = -gammaln(a) - gammaln(b) + gammaln(a + b);
  for (; j < 10; j++) {
    if (x === 0 || x === 1) return x;
    err = ibeta(x, a, b) - p;
    t = Math.exp(a1 * Math.log(x) + b1 * Math.log(1 - x) + afac);
    u = err / t;
    x -= t = u / (1 - 0.5 * Math.min(1, u * (a1 / x - b1 / (1 - x))));
    if (x <= 0) x = 0.5 * (x + t);
    if (x >= 1) x = 0.5 * (x + t + 1);
    if (Math.abs(t) < EPS * x && j > 0) break;
  }
  return x;
}

function erf(x: number): number {
  const cof = [
    -1.3026537197817094, 6.4196979235649026e-1, 1.9476473204185836e-2, -9.561514786808631e-3, -9.46595344482036e-4,
    3.66839497852761e-4, 4.2523324806907e-5, -2.0278578112534e-5, -1.624290004647e-6, 1.30365583558e-6, 1.5626441722e-8,
    -8.5238095915e-8, 6.529054439e-9, 5.059343495e-9, -9.91364156e-10, -2.27365122e-10, 9.6467911e-11, 2.394038e-12,
    -6.886027e-12, 8.94487e-13, 3.13092e-13, -1.12708e-13, 3.81e-16, 7.106e-15, -1.523e-15, -9.4e-17, 1.21e-16,
    -2.8e-17,
  ];
  let j = cof.length - 1;
  let isneg = false;
  let d = 0;
  let dd = 0;
  let tmp: number;
  if (x < 0) {
    x = -x;
    isneg = true;
  }
  const t = 2 / (2 + x);
  const ty = 4 * t - 2;
  for (; j > 0; j--) {
    tmp = d;
    d = ty * d - dd + cof[j]!;
    dd = tmp;
  }
  const res = t * Math.exp(-x * x + 0.5 * (cof[0]! + ty * d) - dd);
  return isneg ? res - 1 : 1 - res;
}

function erfc(x: number): number {
  return 1 - erf(x);
}

function erfcinv(p: number): number {
  let j = 0;
  let x: number, err: number;
  if (p >= 2) return -100;
  if (p <= 0) return 100;
  const pp = p < 1 ? p : 2 - p;
  const t = Math.sqrt(-2 * Math.log(pp / 2));
  x = -0.70711 * ((2.30753 + t * 0.27061) / (1 + t * (0.99229 + t * 0.04481)) - t);
  for (; j < 2; j++) {
    err = erfc(x) - pp;
    x += err / (1.12837916709551257 * Math.exp(-x * x) - x * err);
  }
  return p < 1 ? x : -x;
}

const jStat = {
  gammaln,
  centralF: {
    cdf(x: number, df1: number, df2: number): number {
      if (x < 0) return 0;
      return ibeta((df1 * x) / (df1 * x + df2), df1 / 2, df2 / 2);
    },
    inv(x: number, df1: number, df2: number): number {
      return df2 / (df1 * (1 / ibetainv(x, df1 / 2, df2 / 2) - 1));
    },
  },
  chisquare: {
    cdf(x: number, dof: number): number {
      if (x < 0) return 0;
      return lowRegGamma(dof / 2, x / 2);
    },
    inv(): number {
      throw new Error("chisquare.inv is not part of the dashboard's jStat subset");
    },
  },
  normal: {
    cdf(x: number, mean: number, std: number): number {
      return 0.5 * (1 + erf((x - mean) / Math.sqrt(2 * std * std)));
    },
    inv(p: number, mean: number, std: number): number {
      return -1.41421356237309505 * std * erfcinv(2 * p) + mean;
    },
  },
  studentt: {
    cdf(x: number, dof: number): number {
      const dof2 = dof / 2;
      return ibeta((x + Math.sqrt(x * x + dof)) / (2 * Math.sqrt(x * x + dof)), dof2, dof2);
    },
    inv(p: number, dof: number): number {
      let x = ibetainv(2 * Math.min(p, 1 - p), 0.5 * dof, 0.5);
      x = Math.sqrt((dof * (1 - x)) / x);
      return p > 0.5 ? x : -x;
    },
  },
};

export default jStat;
