import { describe, it } from "vitest";
import jStat from "jstat";
import { expectWithin } from "../helpers/tolerance.ts";
import { intervalBc95 } from "../../analysis/stats/biasCorrectedInterval.ts";
import { bootstrapBiasCorrected } from "../../analysis/stats/bootstrapBias.ts";
import { interval95 } from "../../analysis/stats/percentile.ts";

/** B replicates at the normal quantiles (i + ½)/B of N(mean, sd): a noise-free stand-in for a bootstrap sample. */
function normalReplicates(mean: number, sd: number, B = 4000): Float64Array {
  return Float64Array.from({ length: B }, (_, i) => mean + sd * jStat.normal.inv((i + 0.5) / B, 0, 1));
}

describe("bootstrap intervals and bias correction (Efron 1987; Efron & Tibshirani 1993 §10)", () => {
  it("intervalBc95() equals the percentile interval when the replicates are centred on the estimate (z₀ = 0; Efron 1987 BC)", () => {
    const r = normalReplicates(10, 2);
    const bc = intervalBc95(r, 10)!;
    const pc = interval95(r)!;
    expectWithin(bc[0], pc[0], 1e-9, "lower");
    expectWithin(bc[1], pc[1], 1e-9, "upper");
  });

  it("intervalBc95() takes the percentiles Φ(2z₀ ∓ 1.96) with z₀ capped at 0.5 when the replicates sit below the estimate (Efron 1987)", () => {
    // Replicates N(9, 1) about θ̂ = 10: z₀ = Φ⁻¹(Φ(1)) = 1 → capped 0.5 → percentiles Φ(−0.96) and Φ(2.96).
    const r = normalReplicates(9, 1, 20000);
    const bc = intervalBc95(r, 10)!;
    expectWithin(bc[0], 9 - 0.96, 0.01, "lower = 9 + Φ⁻¹(Φ(−0.96))");
    expectWithin(bc[1], 9 + 2.96, 0.02, "upper = 9 + Φ⁻¹(Φ(2.96))");
  });

  it("bootstrapBiasCorrected() returns 2θ̂ − mean(θ*) for a bias of half a standard error and leaves small or unstable biases alone (Efron & Tibshirani 1993 §10.6 rule, from memory)", () => {
    expectWithin(bootstrapBiasCorrected(normalReplicates(10.5, 1), 10), 9.5, 1e-9, "bias 0.5 se corrected");
    expectWithin(bootstrapBiasCorrected(normalReplicates(10.1, 1), 10), 10, 0, "bias 0.1 se left");
    expectWithin(bootstrapBiasCorrected(normalReplicates(13, 1), 10), 10, 0, "bias 3 se (unstable) left");
  });
});
