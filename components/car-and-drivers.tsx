/** The car, its declared class and its drivers, as every list of entries shows them. */
export function CarAndDrivers({
  car,
  declaredClass,
  drivers,
}: {
  car: string;
  declaredClass: string;
  drivers: string;
}) {
  return (
    <>
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-lg font-semibold">{car}</span>
        <span className="rounded border border-asphalt-400 px-2 text-base">{declaredClass}</span>
      </div>
      <p className="text-base text-asphalt-800">{drivers}</p>
    </>
  );
}
