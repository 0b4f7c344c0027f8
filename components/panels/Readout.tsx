/**
 * One live figure: a term and its formatted value. `data-readout` names it and `data-value` holds the
 * raw SI number (m, degrees, m², lx) so tests can compare it with the photometry core.
 */
export function Readout({
  name,
  label,
  value,
  text,
}: {
  name: string;
  label: string;
  /** null (no figure) leaves data-value empty; the text says why. */
  value: number | null;
  text: string;
}) {
  return (
    <div className="panel-readout">
      <dt>{label}</dt>
      <dd data-readout={name} data-value={value === null || !Number.isFinite(value) ? '' : String(value)}>
        {text}
      </dd>
    </div>
  );
}
