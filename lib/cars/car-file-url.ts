/** Where a car's file is served (GET, to its owner and the officials of its events). */
export function carFileUrl({ carId, fileId }: { carId: string; fileId: string }): string {
  return `/api/cars/${carId}/files/${fileId}`;
}
