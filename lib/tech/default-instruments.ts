/**
 * Instruments a scrutineer can pick for a reading, with a stated standard uncertainty (Type B, not
 * expanded) in the reading's unit. These are starting values for the demo — from memory, typical of
 * the tools' published classes — and not a calibration: the organizer's own traceable equipment
 * list and certificates govern (Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.1.2 asks officials to
 * use approved, traceable equipment).
 */
export const defaultInstruments = [
  { id: "tape-class-2", name: "Steel tape (class II)", standardUncertainty: 0.5, unit: "mm" },
  { id: "height-gauge", name: "Height gauge", standardUncertainty: 0.3, unit: "mm" },
  {
    id: "plumb-and-tape",
    name: "Plumb bob, floor marks and tape",
    standardUncertainty: 1.5,
    unit: "mm",
  },
  { id: "laser-and-tape", name: "Cross-line laser and tape", standardUncertainty: 1.0, unit: "mm" },
  { id: "corner-scales", name: "Corner scales", standardUncertainty: 0.5, unit: "kg" },
  {
    id: "sound-meter-class-1",
    name: "Sound level meter (class 1)",
    standardUncertainty: 0.7,
    unit: "dB(A)",
  },
] as const;

export type Instrument = (typeof defaultInstruments)[number];
