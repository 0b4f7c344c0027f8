/** Rows grouped by position name in the order they come (free-standing units as their own group). */
export function groupByPosition<Row extends { readonly position: string | null }>(
  rows: readonly Row[],
): { key: string; name: string; rows: Row[] }[] {
  const groups: { key: string; name: string; rows: Row[] }[] = [];
  for (const row of rows) {
    const name = row.position ?? 'Free-standing units';
    const last = groups[groups.length - 1];
    if (last && last.name === name) last.rows.push(row);
    else groups.push({ key: `${groups.length}:${name}`, name, rows: [row] });
  }
  return groups;
}
