export interface CsvRowProblem {
  row: number | null;
  label: string;
  message: string;
}

/**
 * The API names each bad row of a refused temperature log as a field ("row 3": "…"); every one is shown, in the
 * order of the file, with anything not about a row last.
 */
export function csvRowProblems(fields: Readonly<Record<string, string>>): CsvRowProblem[] {
  return Object.entries(fields)
    .map(([label, message]) => {
      const match = /^row (\d+)$/i.exec(label.trim());
      // The messages often repeat their row ("row 3: …"); the list already says which row.
      return { row: match ? Number(match[1]) : null, label, message: match ? message.replace(new RegExp(`^row ${match[1]}:\\s*`, 'i'), '') : message };
    })
    .sort((p, q) => (p.row ?? Number.POSITIVE_INFINITY) - (q.row ?? Number.POSITIVE_INFINITY));
}
