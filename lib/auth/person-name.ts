/**
 * What a person is shown by: their name as they gave it, or their e-mail address (whole) only
 * when they have given no name yet.
 */
export function personName(person: { name: string | null; email: string | null }): string {
  const name = person.name?.trim();
  if (name) return name;
  return person.email ?? "";
}
