import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { listUserEvents } from "@/db/queries/list-user-events";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { roleHomePaths } from "@/lib/auth/role-home-path";
import { roleLabels } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Your events" };

/** After sign-in: straight to your role's home when there is one, else a choice. */
export default async function HomePage() {
  const user = await requirePageUser("/home");
  const events = await listUserEvents({ userId: user.id });
  const choices = events.flatMap((event) =>
    roleHomePaths(event.id, event.roles).map((home) => ({ event, ...home })),
  );
  const unique = [...new Map(choices.map((c) => [c.path, c])).values()];
  if (unique.length === 1 && unique[0]) redirect(unique[0].path);
  if (unique.length === 0) redirect("/garage");
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
