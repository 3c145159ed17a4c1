import { describe, expect, it } from "vitest";
import { parameterLabel, parameterValue } from "@/components/history/parameterText";

describe("parameter labels and values for comparing versions", () => {
  it("uses the editor's labels for the fields it has", () => {
    expect(parameterLabel("protocol.hold.durationSeconds")).toBe("Hold › duration");
    expect(parameterLabel("background.accelerationMetresPerSecondSquared")).toBe("Lab acceleration");
    expect(parameterLabel("background.hubbleRatePerSecond")).toBe("Hubble rate H");
    expect(parameterLabel("separation.distanceMetres")).toBe("Full separation d");
  });

  it("uses the editor's words for named values", () => {
    expect(parameterValue("separation.split", "one-branch-stays")).toBe("branch B stays");
    expect(parameterValue("protocol.separation.shape", "cubic")).toBe("cubic (3u² − 2u³)");
    expect(parameterValue("lab.placement", "uniformly-accelerated")).toBe("uniformly accelerated, c²/a from the horizon");
    expect(parameterValue("protocol.kind", "sampled")).toBe("measured profile");
  });

  it("reads any other path as words, dropping the SI unit from the name", () => {
    expect(parameterLabel("environment.gas.pressurePascals")).toBe("Environment › gas › pressure");
    expect(parameterLabel("protocol.samples.0.timeSeconds")).toBe("Protocol › samples › #1 › time");
    expect(parameterLabel("schemaVersion")).toBe("Schema version");
  });

  it("prints a value with the unit its name gives, and other values plainly", () => {
    expect(parameterValue("protocol.hold.durationSeconds", 0.1)).toBe("100 ms");
    expect(parameterValue("separation.distanceMetres", 1e-6)).toBe("1.00 µm");
    expect(parameterValue("background.hubbleRatePerSecond", 2.2e-18)).toBe("2.20 × 10⁻¹⁸ s⁻¹");
    expect(parameterValue("schemaVersion", 1)).toBe("1");
    expect(parameterValue("environment.gas.pressurePascals", 1e-10)).toBe("1.00 × 10⁻¹⁰ Pa");
    expect(parameterValue("environment.radiation.surroundingsTemperatureKelvin", 4)).toBe("4.00 K");
    expect(parameterValue("environment.surface.resistivityOhmMetres", 2.2e-8)).toBe("2.20 × 10⁻⁸ Ω m");
    expect(parameterLabel("environment.surface.resistivityOhmMetres")).toBe("Environment › surface › resistivity");
    expect(parameterValue("source.labMassKg", null)).toBe("none");
    expect(parameterValue("display.showGrid", true)).toBe("yes");
    expect(parameterValue("protocol.samples", { items: 2000 })).toBe("2,000 items");
    expect(parameterValue("background.massKg", 1, false)).toBe("—");
  });
});
