import { z } from "zod";

/** The columns the sign-on desk's table sorts by. */
export const registrationSortKeys = ["car", "drivers", "waiver", "fee"] as const;
export type RegistrationSortKey = (typeof registrationSortKeys)[number];

/** What the table shows: a search and a sort. The page and the CSV export read the same. */
export const registrationViewSchema = z.object({
  q: z.string().trim().max(80, "Keep the search under 80 characters").default(""),
  sort: z.enum(registrationSortKeys).default("car"),
  dir: z.enum(["asc", "desc"]).default("asc"),
});

export type RegistrationView = z.infer<typeof registrationViewSchema>;
