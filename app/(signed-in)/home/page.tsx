import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { listUserEvents } from "@/db/queries/list-user-events";
import { pickHomePath } from "@/lib/auth/pick-home-path";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { roleHomePaths } from "@/lib/auth/role-home-path";
import { roleLabels } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Your events" };

/** After sign-in: straight to the day's job when there is one (lib/auth/pick-home-path.ts), else a
 *  choice; `?all=1` always shows the choice. */
export default async function HomePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requirePageUser("/home");
  const showAll = (await searchParams).all === "1";
  const events = await listUserEvents({ userId: user.id });
  const choices = events.flatMap((event) =>
    roleHomePaths(event.id, event.roles).map((home) => ({ event, ...home })),
  );
  const unique = [...new Map(choices.map((c) => [c.path, c])).values()];
  const straightTo = pickHomePath(
    unique.map((c) => ({ path: c.path, eventStatus: c.event.status })),
  );
  if (straightTo !== null && !(showAll && unique.length > 1)) redirect(straightTo);
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-bold">Your events</h1>
      <ul className="space-y-3">
        {unique.map((choice) => (
          <li key={choice.path}>
            <Link
              href={choice.path}
              className="card flex min-h-touch items-center justify-between gap-3"
            >
              <span>
                <span className="block text-lg font-semibold">{choice.event.name}</span>
                <span className="text-base text-asphalt-800">
                  {choice.event.eventDate} · {choice.event.venueName}
                </span>
              </span>
              <span className="rounded-full bg-accent-soft px-3 py-1 font-semibold text-accent-strong">
                {roleLabels[choice.role]}
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
