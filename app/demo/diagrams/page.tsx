import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Caution } from "@/components/caution";
import { ClassEnvelope } from "@/components/diagrams/class-envelope";
import { ReadingDiagram } from "@/components/diagrams/reading-diagram";
import { isDemo } from "@/lib/env";
import { dimensionLabel } from "@/lib/scrutineer/measurement/dimension-labels";
import {
  CORNERS,
  type Corner,
  type Dimension,
  LENGTH_DIMENSIONS,
} from "@/lib/scrutineer/records/record-schema";
import { SAMPLE_ENVELOPES } from "./sample-envelopes";

export const metadata: Metadata = { title: "Drawings for review" };
export const dynamic = "force-dynamic";

const READINGS: { dimension: Dimension; corner: Corner | null }[] = [
  ...LENGTH_DIMENSIONS.map((dimension) => ({ dimension, corner: null })),
  ...CORNERS.map((corner) => ({ dimension: "cornerWeightKg" as const, corner })),
  { dimension: "noiseDbA", corner: null },
];

/** Demo only: every reading drawing and sample class envelopes, for reviewing the drawings. */
export default function DemoDiagramsPage() {
  if (!isDemo) notFound();
  return (
    <div className="space-y-8">
      <header className="space-y-2">
        <h1 className="text-3xl font-bold">Drawings for review</h1>
        <p>
          Every reading drawing a scrutineer sees beside a reading field, and the class envelope as
          the pre-check and the car card draw it. This page does not exist in a live deployment.
        </p>
      </header>

      <section className="space-y-3" aria-labelledby="readings-heading">
        <h2 id="readings-heading" className="text-2xl font-bold">
          Where each reading is taken
        </h2>
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
          {READINGS.map(({ dimension, corner }) => (
            <li key={`${dimension}-${corner ?? ""}`} className="space-y-1">
              <h3 className="text-base font-semibold first-letter:uppercase">
                {dimensionLabel(dimension, corner)}
              </h3>
              <ReadingDiagram dimension={dimension} corner={corner} className="w-full" />
            </li>
          ))}
        </ul>
        <Caution>
          Readings are taken with the engine off (the static noise test is the only one with it
          running), the car on the level pad, and nobody under a car that is not secured.
        </Caution>
      </section>

      <section className="space-y-6" aria-labelledby="envelopes-heading">
        <div className="space-y-2">
          <h2 id="envelopes-heading" className="text-2xl font-bold">
            Class envelopes
          </h2>
          <p>
            <strong className="font-semibold">Example numbers only:</strong> invented cars against
            the demo's invented classes, each shown in millimetres and in inches.
          </p>
        </div>
        {SAMPLE_ENVELOPES.map((sample) => (
          <article key={sample.title} className="space-y-3">
            <h3 className="text-xl font-bold">{sample.title}</h3>
            <p className="text-base text-asphalt-800">{sample.note}</p>
            <div className="grid gap-4 lg:grid-cols-2">
              {(["mm", "in"] as const).map((unit) => (
                <div key={unit} className="space-y-1">
                  <p className="text-base font-semibold">
                    Example, shown in {unit === "mm" ? "millimetres" : "inches"}
                  </p>
                  <ClassEnvelope {...sample.props} unit={unit} />
                </div>
              ))}
            </div>
          </article>
        ))}
      </section>
    </div>
  );
}
