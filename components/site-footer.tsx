export function SiteFooter() {
  return (
    <footer className="mt-12 border-t border-asphalt-300 bg-asphalt-100 px-4 py-6 text-base text-asphalt-800">
      <div className="mx-auto max-w-5xl space-y-2">
        <p>
          <strong>Motorsport is dangerous.</strong> Plumbline records readings and computes
          verdicts; it never replaces the chief scrutineer&apos;s judgment, the sanctioning
          body&apos;s rulebook or local law. Where a rule is unclear, the chief scrutineer decides.
        </p>
        <p className="text-asphalt-700">Plumbline — scrutineering and run groups for club days.</p>
      </div>
    </footer>
  );
}
