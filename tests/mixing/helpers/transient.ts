// Transient 1-D advection–dispersion of a conservative tracer after a river step
// (Loder & Reichard 1981; derived river-step case 100 → 50), solved by Crank–Nicolson.

/**
 * Concentration profile t seconds after the river value steps from `before` to `after`,
 * in a steady salinity field S = 35·exp(U·x/K) (x ≤ 0, seaward-positive, mouth at 0),
 * sea value `sea` held at the mouth. Returns C as a function of S by interpolation.
 */
export function stepProfile(p: {
  velocityMs: number;
  dispersionM2s: number;
  before: number;
  after: number;
  sea: number;
  seconds: number;
  lengthM: number;
}): (s: number) => number {
  const { velocityMs: U, dispersionM2s: K } = p;
  const L = p.lengthM;
  const dx = 100;
  const N = Math.round(L / dx) + 1;
  const x = Array.from({ length: N }, (_, i) => -L + i * dx);
  const sal = x.map((v) => 35 * Math.exp((U * v) / K));
  let c = sal.map((s) => p.before + ((p.sea - p.before) * s) / 35);
  const dt = 600;
  const steps = Math.round(p.seconds / dt);
  const r = (K * dt) / (dx * dx);
  const a = (U * dt) / (2 * dx);
  // Interior: c_t = −U c_x + K c_xx; CN: (I − ½L)c¹ = (I + ½L)c⁰, L c_i = r(c_{i−1} − 2c_i + c_{i+1}) − a(c_{i+1} − c_{i−1}).
  const lo = 0.5 * (r + a),
    di = 1 + r,
    up = 0.5 * (r - a);
  for (let k = 0; k < steps; k++) {
    const rhs = new Array<number>(N);
    rhs[0] = p.after;
    rhs[N - 1] = p.sea;
    for (let i = 1; i < N - 1; i++)
      rhs[i] = c[i]! + 0.5 * (r * (c[i - 1]! - 2 * c[i]! + c[i + 1]!) - a * (c[i + 1]! - c[i - 1]!));
    // Thomas algorithm on −lo·c_{i−1} + di·c_i − up·c_{i+1} = rhs_i with Dirichlet ends.
    const cp = new Array<number>(N).fill(0);
    const dp = new Array<number>(N).fill(0);
    dp[0] = rhs[0]!;
    for (let i = 1; i < N - 1; i++) {
      const m = di - -lo * cp[i - 1]!;
      cp[i] = -up / m;
      dp[i] = (rhs[i]! + lo * dp[i - 1]!) / m;
    }
    const next = new Array<number>(N);
    next[N - 1] = rhs[N - 1]!;
    for (let i = N - 2; i >= 1; i--) next[i] = dp[i]! - cp[i]! * next[i + 1]!;
    next[0] = rhs[0]!;
    c = next;
  }
  return (s: number) => {
    const xs = (K / U) * Math.log(s / 35);
    const f = (xs + L) / dx;
    const i = Math.min(N - 2, Math.max(0, Math.floor(f)));
    return c[i]! + (f - i) * (c[i + 1]! - c[i]!);
  };
}
