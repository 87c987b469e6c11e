import { describe, expect, it } from "vitest";
import { DEFAULT_FLAG_MAP, flagTarget, isRowFlagHeader, readQcFlag } from "../../analysis/io/qcFlags.ts";

describe("QC flags (IOC Manuals and Guides 54 vol. 3, 2013 numeric scheme; letters and words common practice)", () => {
  it.each([
    ["1", "accept"],
    ["2", "accept"],
    ["3", "reject"],
    ["4", "reject"],
    ["4.0", "reject"],
    ["9", "missing"],
    ["A", "accept"],
    ["R", "reject"],
    ["good", "accept"],
    ["Bad", "reject"],
    ["", "accept"],
  ] as const)("readQcFlag(%j) = %s with the default map", (text, decision) => {
    expect(readQcFlag(text)).toBe(decision);
  });

  it("readQcFlag() returns undefined for an unknown flag and uses a custom map when given", () => {
    expect(readQcFlag("Z")).toBeUndefined();
    expect(readQcFlag("Z", { ...DEFAULT_FLAG_MAP, z: "accept" })).toBe("accept");
  });

  it("flagTarget() finds the value column of <name>_flag, <name>_qc, flag_<name> and '<name> flag' headers", () => {
    const headers = ["station", "Fe (nmol/L)", "Fe_flag", "Si", "Si_qc", "flag_Cd", "Cd_ngL", "Mn", "Mn flag", "flag"];
    expect(flagTarget("Fe_flag", headers)).toBe("Fe (nmol/L)");
    expect(flagTarget("Si_qc", headers)).toBe("Si");
    expect(flagTarget("flag_Cd", headers)).toBe("Cd_ngL");
    expect(flagTarget("Mn flag", headers)).toBe("Mn");
    expect(flagTarget("flag", headers)).toBeUndefined();
    expect(flagTarget("Zn_flag", headers)).toBeUndefined();
    expect(isRowFlagHeader("flag")).toBe(true);
    expect(isRowFlagHeader("QC_flag")).toBe(true);
    expect(isRowFlagHeader("Fe_flag")).toBe(false);
  });
});
