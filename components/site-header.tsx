import Link from "next/link";
import { shortPersonName } from "@/lib/auth/short-person-name";
import { HideOnBoard } from "./hide-on-board";
import { PlumbMark } from "./icons/plumb-mark";
import { SiteHeaderRow } from "./site-header-row";

export function SiteHeader({
  userName,
  signOutAction,
}: {
  userName: string | null;
  signOutAction?: () => Promise<void>;
}) {
  return (
    <header className="border-b-4 border-accent bg-asphalt-950 text-asphalt-50">
      <SiteHeaderRow>
        <Link
          href={userName ? "/home" : "/"}
          className="flex min-h-touch items-center gap-2 text-xl font-bold tracking-wide"
        >
          <PlumbMark className="size-8 text-asphalt-50" />
          {/* On the narrowest phones the mark alone leaves room for Events and the account. */}
          <span className="max-[399px]:sr-only">Plumbline</span>
        </Link>
        <HideOnBoard>
          <div className="flex min-w-0 items-center gap-1">
            <Link
              href="/events"
              className="flex min-h-touch items-center px-2 text-lg font-semibold underline-offset-4 hover:underline"
            >
              Events
            </Link>
            {userName && signOutAction ? (
              <form action={signOutAction} className="flex min-w-0 items-center gap-2">
                <Link
                  href="/profile"
                  className="flex min-h-touch min-w-0 items-center text-base underline decoration-asphalt-400 underline-offset-4"
                  data-testid="signed-in-as"
                  title={`${userName} — your profile`}
                >
                  <span className="sm:hidden">{shortPersonName(userName)}</span>
                  <span className="hidden sm:inline">{userName}</span>
                </Link>
                <button
                  type="submit"
                  className="btn min-h-touch border-2 border-asphalt-400 text-asphalt-50 hover:bg-asphalt-800"
                >
                  Sign out
                </button>
              </form>
            ) : (
              <nav className="flex items-center gap-1" aria-label="Account">
                <Link
                  href="/sign-up"
                  className="btn min-h-touch px-2 text-asphalt-50 underline underline-offset-4 hover:bg-asphalt-800"
                >
                  <span className="sm:hidden">Sign up</span>
                  <span className="hidden sm:inline">Create account</span>
                </Link>
                <Link
                  href="/sign-in"
                  className="btn border-2 border-asphalt-400 text-asphalt-50 hover:bg-asphalt-800"
                >
                  Sign in
                </Link>
              </nav>
            )}
          </div>
        </HideOnBoard>
      </SiteHeaderRow>
    </header>
  );
}
