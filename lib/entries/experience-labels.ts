import type { ExperienceLevel } from "../paddock/drive";

/** The experience levels in words, as the entry and invitation forms offer them. */
export const experienceLabels: Record<ExperienceLevel, string> = {
  novice: "Novice — first season or few track days",
  intermediate: "Intermediate — several seasons of track days",
  advanced: "Advanced — regular time-attack or sprint entrant",
  expert: "Expert — race licence or instructor",
};
