// The shapes the intake pages show; they mirror what app/data/intakes.server.ts returns.

export type IntakeState = "previewed" | "committed" | "discarded" | "rolled-back";

export interface IntakeCounts {
  new: number;
  changed: number;
  unchanged: number;
  rejected: number;
  warnings: number;
}

export interface IntakeSummary {
  id: string;
  kind: "parts" | "offers";
  fileName: string;
  sizeBytes: number;
  state: IntakeState;
  uploadedBy: { id: string; name: string };
  createdAt: string | Date;
  committedAt: string | Date | null;
  counts: IntakeCounts;
  canCommit: boolean;
}

export interface ShownProblem {
  row: number | null;
  column: string | null;
  value: string | null;
  message: string;
  severity: "error" | "warning";
}

export interface FieldChange {
  field: string;
  before: unknown;
  after: unknown;
  /** An empty cell in a column the file has cleared the value. */
  cleared?: boolean;
}

export interface ReadingView {
  column: string;
  value: string;
  reading: string;
  count: number;
  rows: number[];
}

export interface MissingPartView {
  id: string;
  manufacturer: string;
  partNumber: string;
}

export interface RowChange {
  row: number;
  status: "new" | "changed" | "unchanged";
  manufacturer: string;
  partNumber: string;
  fields: FieldChange[];
}

export const STATE_LABELS: Record<IntakeState, string> = {
  previewed: "previewed",
  committed: "committed",
  discarded: "discarded",
  "rolled-back": "rolled back",
};
