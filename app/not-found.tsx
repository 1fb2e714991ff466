import Link from "next/link";

export default function NotFound() {
  return (
    <div className="card space-y-3">
      <h1 className="text-3xl font-bold">Nothing here</h1>
      <p>That page does not exist, or the link is out of date.</p>
      <Link href="/home" className="btn-secondary">
        Back to your events
      </Link>
    </div>
  );
}
