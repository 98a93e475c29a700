import type { DatasetProblem } from '../../../shared/schemas/datasets';

/**
 * A problem with the file or the mapping, located where possible: `row` is the 1-based row of
 * the file (the header is row 1), `column` the header text. Its message is meant for the user.
 */
export class DatasetInputError extends Error {
  constructor(
    message: string,
    readonly row: number | null = null,
    readonly column: string | null = null,
  ) {
    super(message);
    this.name = 'DatasetInputError';
  }

  toProblem(): DatasetProblem {
    return { message: this.message, row: this.row, column: this.column };
  }
}

/** "Row 12, column "arrived": …" — the form every located message takes. */
export function atCell(row: number, column: string, what: string): DatasetInputError {
  return new DatasetInputError(`Row ${row}, column "${column}": ${what}`, row, column);
}
