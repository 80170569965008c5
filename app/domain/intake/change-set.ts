// Whether a preview's change set still holds: the same status and the same field changes for every row.

export interface ChangeSetRow {
  row: number;
  status: string;
  value: { manufacturer: string; partNumber: string };
  changes: ReadonlyArray<{ field: string; before: unknown; after: unknown }>;
}

const fingerprint = (row: ChangeSetRow) => JSON.stringify([row.status, row.changes.map((c) => [c.field, c.before ?? null, c.after ?? null])]);

/** The first row whose status or changes differ between the preview and now, or null when the change set holds. */
export function findChangedRow<R extends ChangeSetRow>(preview: readonly R[], now: readonly ChangeSetRow[]): R | null {
  const current = new Map(now.map((row) => [row.row, fingerprint(row)]));
  for (const row of preview) if (current.get(row.row) !== fingerprint(row)) return row;
  return null;
}
