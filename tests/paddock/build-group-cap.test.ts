// groupCap: the organizer's number wins; otherwise track length × density.
import { describe, expect, it } from "vitest";
import { defaultCarsPerKm, groupCap } from "../../lib/paddock/group-cap";

describe("groupCap", () => {
  it("takes the organizer's number of cars first", () => {
    expect(groupCap({ maxCarsOnTrack: 18, trackLengthM: 3000, carsPerKm: 9 })).toEqual({
      cars: 18,
      source: "18 cars: set by the organizer",
    });
  });

  it("derives the cap from the track length and the organizer's density, rounding down", () => {
    // 3.2 km × 7.5 per km = 24 exactly (binary rounding must not make it 23).
    expect(groupCap({ maxCarsOnTrack: null, trackLengthM: 3200, carsPerKm: "7.5" }).cars).toBe(24);
    expect(groupCap({ maxCarsOnTrack: null, trackLengthM: 2950, carsPerKm: 8 }).cars).toBe(23);
  });

  it("uses the stated default density when the organizer gives none, and says where it comes from", () => {
    const cap = groupCap({ maxCarsOnTrack: null, trackLengthM: 3000, carsPerKm: null });
    expect(cap.cars).toBe(3 * defaultCarsPerKm);
    // Source: common practice (no source) — club track days run roughly 6–13 cars per km.
    expect(defaultCarsPerKm).toBeGreaterThanOrEqual(6);
    expect(defaultCarsPerKm).toBeLessThanOrEqual(13);
    expect(cap.source).toContain("common practice (no source)");
    expect(cap.source.length).toBeLessThanOrEqual(300);
  });

  it("never gives fewer than one car, and refuses without a number or a length", () => {
    expect(groupCap({ trackLengthM: 50, carsPerKm: 2 }).cars).toBe(1);
    expect(() => groupCap({ maxCarsOnTrack: null, trackLengthM: null })).toThrow(/track length/);
  });
});
