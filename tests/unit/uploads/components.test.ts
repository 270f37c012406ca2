import { describe, expect, it } from "vitest";
import { previewFullLoad, previewOcv } from "@/lib/uploads";

describe("component tables", () => {
  it("reads a full-load curve with units from the header (rad/s converted by 30/π)", () => {
    const r = previewFullLoad({ text: "engine speed [rad/s];torque [N·m]\n100;150\n300;200\n" });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.confirmation.speed.unit).toBe("rad/s");
    expect(r.data.speed_rpm[0]).toBeCloseTo(954.9297, 4); // 100 rad/s · 60/(2π)
    expect(r.data.torque_nm).toEqual([150, 200]);
  });

  it("reads an OCV curve in percent and returns fractions", () => {
    const r = previewOcv({ text: "SOC [%]\tOCV [V]\n0\t300\n50\t360\n100\t400\n" });
    expect(r.ok && r.data).toEqual({ soc: [0, 0.5, 1], voltage_v: [300, 360, 400] });
  });

  it("guesses percent from values above 1 when the header has no unit, and says so", () => {
    const r = previewOcv({ text: "soc,voltage\n10,320\n90,390\n" });
    expect(r.proposal?.notes).toContain("SOC values above 1: read as percent");
    expect(r.ok && r.data.soc).toEqual([0.1, 0.9]);
  });

  it("warns (does not refuse) when the voltage dips with rising SOC", () => {
    const r = previewOcv({ text: "soc,voltage [V]\n0,300\n0.5,330\n0.6,329.5\n1,400\n" });
    expect(r.ok && r.warnings).toEqual(["line 4: voltage 329.5 V is below 330 V at a lower SOC; an OCV curve normally rises with SOC"]);
  });
});
