// The text offered for pasting into block list fields reads back, through the notebook's own list
// parser, as exactly the uploaded breakpoints.
import { describe, expect, it } from "vitest";
import { parseList } from "@/lib/notebook";
import { blockValueLines } from "@/lib/library/block-values";
import { previewFullLoad, previewOcv } from "@/lib/uploads";

describe("component tables as block list text", () => {
  it("full-load curve: speeds in rpm, torques in N·m (rad/s upload converted by 30/π)", () => {
    const r = previewFullLoad({ text: "speed [rad/s],torque [Nm]\n83.7758,120\n314.159,180.5\n628.319,150\n" });
    if (!r.ok) throw new Error("fixture");
    const [speeds, torques] = blockValueLines("engine_full_load", r.data);
    const s = parseList(speeds[1], { quantity: "angular_speed", unit: "rpm" });
    const t = parseList(torques[1], { quantity: "torque", unit: "N·m" });
    expect(s.ok && s.values.map((x) => Number(x.toFixed(6)))).toEqual(r.data.speed_rpm.map((x) => Number(x.toFixed(6))));
    expect(t.ok && t.values).toEqual([120, 180.5, 150]);
  });

  it("OCV: SOC points as fractions and voltages in V", () => {
    const r = previewOcv({ text: "soc [%],ocv [V]\n0,300\n50,355.5\n100,402\n" });
    if (!r.ok) throw new Error("fixture");
    const [soc, volts] = blockValueLines("battery_ocv", r.data);
    expect(soc[1]).toBe("0, 0.5, 1");
    const v = parseList(volts[1], { quantity: "voltage", unit: "V" });
    expect(v.ok && v.values).toEqual([300, 355.5, 402]);
  });
});
