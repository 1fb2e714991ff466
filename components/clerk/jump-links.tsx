/** Links to each part of the clerk's long page, so a phone gets there with one thumb. */
export function JumpLinks({ published }: { published: boolean }) {
  const links = [
    ...(published ? [{ href: "#day-heading", label: "During the day" }] : []),
    { href: "#glance-heading", label: "Cars" },
    { href: "#settings-heading", label: "The day" },
    { href: "#groups-heading", label: "Run groups" },
    { href: "#publish-heading", label: "Publish" },
    { href: "#exports-heading", label: "Print" },
  ];
  return (
    <nav aria-label="Parts of this page" data-testid="jump-links">
      <ul className="flex flex-wrap gap-2">
        {links.map((link) => (
          <li key={link.href}>
            <a className="btn-secondary px-3" href={link.href}>
              {link.label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}
