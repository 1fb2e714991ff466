import Link from "next/link";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/lib/auth/get-session-user";

export default async function StartPage() {
  if (await getSessionUser()) redirect("/home");
  return (
    <div className="space-y-6">
      <h1 className="text-4xl font-bold leading-tight">
        Every car measured, cleared and grouped before it runs.
      </h1>
      <p className="text-lg">
        Plumbline is the tech line, the class check and the run sheet for club time-attack days.
        Entrants enter their cars and carry a signed pass; scrutineers measure aero and check safety
        items on their phones, even with no signal; the clerk of course groups only cleared cars.
      </p>
      <div className="flex flex-wrap gap-3">
        <Link href="/events" className="btn-primary">
          Find an event
        </Link>
        <Link href="/sign-up" className="btn-secondary">
          Create an account
        </Link>
        <Link href="/sign-in" className="btn-secondary">
          Sign in
        </Link>
      </div>
    </div>
  );
}
