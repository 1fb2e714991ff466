import Link from "next/link";

export default function Forbidden() {
  return (
    <div className="card space-y-3" data-testid="forbidden">
      <h1 className="text-3xl font-bold">Not your page</h1>
      <p>
        Your role in this event does not open this page. If you think it should, ask the organizer.
      </p>
      <Link href="/home" className="btn-secondary">
        Back to your events
      </Link>
    </div>
  );
}
