import { describe, expect, it } from "vitest";
import { methodsHref } from "@/components/methods/methods-href";

describe("the link from a number to its formula", () => {
  it("goes to the formula's anchor, carrying the number as shown for the Methods page to echo", () => {
    const href = methodsHref("schwarzschild-exact-em", { label: "Hold rate into the horizon, electromagnetic, exact", value: "3.2 × 10⁻⁴ s⁻¹", inputs: "b = 3 r_s" });
    const url = new URL(href, "http://branchline.test");
    expect(url.pathname).toBe("/methods");
    expect(url.hash).toBe("#schwarzschild-exact-em");
    expect(Object.fromEntries(url.searchParams)).toEqual({ from: "schwarzschild-exact-em", label: "Hold rate into the horizon, electromagnetic, exact", value: "3.2 × 10⁻⁴ s⁻¹", inputs: "b = 3 r_s" });
  });

  it("is the plain anchor without an echo", () => {
    expect(methodsHref("flat-far-field-em")).toBe("/methods#flat-far-field-em");
  });
});
