"use client";
import { ClassEnvelope } from "@/components/diagrams/class-envelope";
import { envelopeFromClassCheck } from "@/components/diagrams/envelope-from-class-check";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { useTech } from "./tech-context";

/**
 * The class envelope with the car's wing drawn in it: the declared class, and the class the car
 * moves up to when that differs. Drawn from the preview verdict on this phone.
 */
export function EnvelopePanel({ verdict }: { verdict: Verdict }) {
  const { ruleSet } = useTech();
  const classIds = [
    ...new Set(
      [verdict.declaredClassId, verdict.classId].filter((id): id is string => id !== null),
    ),
  ];
  const drawings = classIds.flatMap((classId) => {
    const check = verdict.classChecks.find((c) => c.classId === classId);
    const cls = ruleSet.classes.find((c) => c.id === classId);
    if (!check || !cls) return [];
    const props = envelopeFromClassCheck({
      check,
      dimensions: verdict.dimensions,
      unit: verdict.display.length,
      wing: cls.aero.wing,
    });
    return props ? [{ classId, props }] : [];
  });
  if (drawings.length === 0) return null;
  return (
    <section className="space-y-3" aria-labelledby="envelope-title" data-testid="envelope-panel">
      <h2 id="envelope-title" className="text-2xl font-bold">
        Wing against the class
      </h2>
      <p className="text-base text-asphalt-700">
        Preview from the readings on this device; not to scale.
      </p>
      {drawings.map(({ classId, props }) => (
        <ClassEnvelope key={classId} {...props} />
      ))}
    </section>
  );
}
