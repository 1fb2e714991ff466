"use client";
import { useEffect, useState } from "react";
import { listKeptPassPages } from "@/lib/offline/list-kept-pass-pages";

type Place = "tech" | "entrant" | "other";

/** Which part of Plumbline a path belongs to, for the words of the "No signal" page. */
function placeOf(path: string): Place {
  if (/^\/(tech|clerk|registration|organizer)(\/|$)/.test(path)) return "tech";
  if (/^\/(garage|entries|home|events|profile|pre-check|invites|guardian)(\/|$)/.test(path))
    return "entrant";
  return "other";
}

/**
 * The words of the "No signal" page for where the person was: the service worker shows that
 * page at the address they asked for, so the path says whether they were on the tech line or in
 * their garage. An entrant is pointed to the passes this phone has kept.
 */
export function NoSignalWords() {
  const [place, setPlace] = useState<Place>("other");
  const [passes, setPasses] = useState<{ path: string; label: string }[]>([]);
  useEffect(() => {
    setPlace(placeOf(window.location.pathname));
    listKeptPassPages()
      .then(setPasses)
      .catch(() => undefined);
  }, []);
  return (
    <div className="space-y-3" data-testid="no-signal-words" data-place={place}>
      {place === "tech" ? (
        <p>
          This page was not saved on this phone. Pages saved with{" "}
          <strong>Prepare for offline</strong> on the tech line still open, and everything you
          recorded is kept on the phone until it can be sent.
        </p>
      ) : place === "entrant" ? (
        <p>
          Your garage and entries need a signal to open. Anything you were sending was not lost:
          send it again once the signal is back.
        </p>
      ) : (
        <p>This page was not saved on this phone, and it needs a signal to open.</p>
      )}
      {passes.length > 0 ? (
        <div className="space-y-2">
          <p>Passes you have opened on this phone open without signal:</p>
          <ul className="space-y-2" data-testid="kept-passes">
            {passes.map((p) => (
              <li key={p.path}>
                <a href={p.path} className="btn-secondary w-full">
                  {p.label}
                </a>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
