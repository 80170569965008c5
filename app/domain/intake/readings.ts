// What the intake understood from cells it did not take literally ("1.000" in a stock column, "n/a", "TO92"),
// grouped by column and text, so a 100k-row file with "1+" in every row is one line of the preview.

/** One way a cell was read, with how often and where. */
export interface IntakeReading {
  column: string;
  /** The cell as typed (empty when the reading fills an empty cell). */
  value: string;
  reading: string;
  /** How many accepted cells were read this way. */
  count: number;
  /** The first few rows (spreadsheet numbering). */
  rows: number[];
}

/** A reading of one cell, as a cell reader or a row rule reports it. */
export interface CellReading {
  column: string;
  value: string;
  reading: string;
}

/** Readings kept per intake; more distinct ones are counted but not listed. */
export const MAX_READINGS = 500;
const ROWS_SHOWN = 5;

export class ReadingCollector {
  private readonly byKey = new Map<string, IntakeReading>();
  /** Distinct readings that did not fit under MAX_READINGS. */
  overflow = 0;

  add(row: number, cell: CellReading): void {
    const key = `${cell.column}\u0000${cell.value}\u0000${cell.reading}`;
    const known = this.byKey.get(key);
    if (known) {
      known.count += 1;
      if (known.rows.length < ROWS_SHOWN) known.rows.push(row);
    } else if (this.byKey.size < MAX_READINGS) {
      this.byKey.set(key, { ...cell, count: 1, rows: [row] });
    } else {
      this.overflow += 1;
    }
  }

  /** In the order first met (row, then column order). */
  list(): IntakeReading[] {
    return [...this.byKey.values()];
  }
}
