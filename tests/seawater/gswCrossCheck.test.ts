import { spawnSync } from "node:child_process";
import { describe, it } from "vitest";
import { randomLcg, randomUniform } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import {
  practicalSalinityFromConductivity,
  practicalSalinityFromRt,
} from "../../analysis/seawater/practicalSalinity.ts";
import { conductivityFromPracticalSalinity } from "../../analysis/seawater/conductivityFromSalinity.ts";
import { densityEos80 } from "../../analysis/seawater/densityEos80.ts";
import { referenceSalinityFromPractical } from "../../analysis/seawater/salinityScales.ts";

// Debian's python3-gsw (TEOS-10 GSW-Python over GSW-C) is a package for /usr/bin/python3, not for other Pythons.
const PYTHON = "/usr/bin/python3";
const probe = spawnSync(PYTHON, ["-c", "import gsw; print(gsw.__version__)"], { encoding: "utf8" });
const haveGsw = probe.status === 0;
if (!haveGsw) {
  console.log(
    "gswCrossCheck: skipped — Debian python3-gsw not importable by /usr/bin/python3 (apt-get install -y python3-gsw)",
  );
}

const SCRIPT = `
import json, sys, gsw, numpy as np
d = json.load(sys.stdin)
out = {
  "sp": gsw.SP_from_C(np.array(d["C"]), np.array(d["t"]), np.array(d["p"])).tolist(),
  "c": gsw.C_from_SP(np.array(d["S"]), np.array(d["t"]), np.array(d["p"])).tolist(),
  "rho": gsw.rho_t_exact(gsw.SR_from_SP(np.array(d["S"])), np.array(d["t"]), 0 * np.array(d["p"])).tolist(),
  "spLow": gsw.SP_from_C(np.array(d["Clow"]), np.array(d["t"]), np.array(d["p"])).tolist(),
  "spRt": gsw.SP_salinometer(np.array(d["Rt"]), np.array(d["t"])).tolist(),
}
json.dump(out, sys.stdout)
`;

describe.skipIf(!haveGsw)(
  `cross-check against Debian python3-gsw ${haveGsw ? probe.stdout.trim() : ""} (TEOS-10 GSW, IOC/SCOR/IAPSO 2010)`,
  () => {
    const u = randomUniform.source(randomLcg(78));
    const n = 400;
    const C = Array.from({ length: n }, u(0.05, 65));
    const S = Array.from({ length: n }, u(0.02, 42));
    const t = Array.from({ length: n }, u(-2, 35));
    const p = Array.from({ length: n }, u(0, 6000));
    const logC = u(Math.log(0.003), Math.log(4));
    const Clow = Array.from({ length: n }, () => Math.exp(logC()));
    const Rt = Array.from({ length: n }, u(0.001, 1.3));
    const run = () => {
      const r = spawnSync(PYTHON, ["-c", SCRIPT], {
        input: JSON.stringify({ C, S, t, p, Clow, Rt }),
        encoding: "utf8",
      });
      if (r.status !== 0) throw new Error(`python3-gsw failed: ${r.stderr}`);
      return JSON.parse(r.stdout) as {
        sp: (number | null)[];
        c: number[];
        rho: number[];
        spLow: (number | null)[];
        spRt: (number | null)[];
      };
    };
    const ref = haveGsw ? run() : { sp: [], c: [], rho: [], spLow: [], spRt: [] };

    it("practicalSalinityFromConductivity() equals gsw.SP_from_C within 1e-10 on 400 seeded random (C, t90, p) points, Hill branch included", () => {
      let compared = 0;
      for (let i = 0; i < n; i++) {
        const expected = ref.sp[i];
        if (expected === null || !Number.isFinite(expected) || expected > 42) continue; // GSW returns NaN below 0
        compared++;
        expectWithin(
          practicalSalinityFromConductivity(C[i], t[i], p[i]),
          expected,
          1e-10,
          `C=${C[i]}, t=${t[i]}, p=${p[i]}`,
        );
      }
      expectWithin(compared, n, n / 2, "at least half of the points compared");
    });

    it("practicalSalinityFromConductivity() equals gsw.SP_from_C within 1e-12 on 400 seeded low conductivities 0.003–4 mS/cm (Hill et al. 1986 branch with the GSW ratio)", () => {
      let compared = 0;
      for (let i = 0; i < n; i++) {
        const expected = ref.spLow[i];
        if (expected === null || !Number.isFinite(expected)) continue; // GSW: invalid where Hill dips below 0
        compared++;
        expectWithin(
          practicalSalinityFromConductivity(Clow[i], t[i], p[i]),
          expected,
          1e-12,
          `C=${Clow[i]}, t=${t[i]}, p=${p[i]}`,
        );
      }
      expectWithin(compared, n, n / 4, "most low-conductivity points compared");
    });

    it("practicalSalinityFromRt() equals gsw.SP_salinometer within 1e-10 on 400 seeded (Rt, t90) points", () => {
      for (let i = 0; i < n; i++) {
        const expected = ref.spRt[i];
        if (expected === null || !Number.isFinite(expected)) continue;
        expectWithin(practicalSalinityFromRt(Rt[i], t[i]), expected, 1e-10, `Rt=${Rt[i]}, t=${t[i]}`);
      }
    });

    it("conductivityFromPracticalSalinity() equals gsw.C_from_SP within 1e-9 mS/cm on 400 seeded random (S, t90, p) points", () => {
      for (let i = 0; i < n; i++) {
        expectWithin(
          conductivityFromPracticalSalinity(S[i], t[i], p[i]),
          ref.c[i],
          1e-9,
          `S=${S[i]}, t=${t[i]}, p=${p[i]}`,
        );
      }
    });

    it("densityEos80(S, t90, 0) agrees with TEOS-10 gsw.rho_t_exact(SR, t90, 0) within 0.01 kg/m³", () => {
      for (let i = 0; i < n; i++) {
        expectWithin(
          densityEos80(S[i], t[i], 0),
          ref.rho[i],
          0.01,
          `S=${S[i]} (SR=${referenceSalinityFromPractical(S[i])}), t=${t[i]}`,
        );
      }
    });
  },
);
