/** The messages for one field, tied to its input by id for screen readers. */
export function FieldError({ id, messages }: { id: string; messages?: string[] | undefined }) {
  if (!messages || messages.length === 0) return null;
  return (
    <p id={id} className="field-error" role="alert">
      {messages.join(" ")}
    </p>
  );
}
