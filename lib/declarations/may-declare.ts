/** Who may change an entry's declarations: its driver or the car's owner (a co-driver reads them). */
export function mayDeclare(facts: { driverId: string; ownerId: string }, userId: string): boolean {
  return facts.driverId === userId || facts.ownerId === userId;
}
