/** "12 of 2000 characters" under a text field; turns to the attention look near the limit. */
export function CharacterCount({ length, max, id }: { length: number; max: number; id: string }) {
  const near = length >= max * 0.9;
  return (
    <span
      id={id}
      className={`block text-right text-sm tabular ${near ? "font-semibold text-attention" : "text-asphalt-700"}`}
      data-testid="character-count"
    >
      {length} of {max} characters
    </span>
  );
}
