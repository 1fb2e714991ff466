/** Places still free in the field: capacity less the entries in it, never below zero. */
export function placesLeft({ capacity, entered }: { capacity: number; entered: number }): number {
  return Math.max(0, capacity - entered);
}
