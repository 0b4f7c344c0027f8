/** A timestamp in the reader's local time (the server renders its own; the browser's wins). */
export function LocalTime({ iso }: { iso: string }) {
  const date = new Date(iso);
  const text = Number.isNaN(date.getTime())
    ? iso
    : date.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
  return (
    <time dateTime={iso} suppressHydrationWarning>
      {text}
    </time>
  );
}
