/** A typed name as it is compared: Unicode NFC, spaces trimmed and runs of white space made one,
 *  lower case. Accents and letters are kept: "Zoë" is not "Zoe". */
export function comparableName(name: string): string {
  return name.normalize("NFC").trim().replace(/\s+/gu, " ").toLocaleLowerCase("en");
}

/**
 * Whether the name typed to accept a waiver is the person's full name as their profile gives it,
 * forgiving only case and spacing ("  anna   DE la cruz " matches "Anna de la Cruz"). An empty
 * profile name matches nothing.
 */
export function namesMatch(typed: string, profileName: string | null): boolean {
  if (profileName === null) return false;
  const expected = comparableName(profileName);
  return expected !== "" && comparableName(typed) === expected;
}
