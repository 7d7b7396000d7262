import { useId, useRef, useState } from 'react';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { FieldError } from '../../../components/ui/Field';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { UnusualValueQuestion } from '../../../components/ui/UnusualValueQuestion';
import { isApiError } from '../../../lib/api-error';
import { useUploadReadingsCsv } from '../api/upload-readings-csv';
import { csvRowProblems } from '../utils/csv-problems';

/** The API refuses a log over 2 MB; a logger’s export of weeks stays well below it. */
const maxCsvBytes = 2 * 1024 * 1024;

/** A logger's export, `time,tempC` per row: every row goes in, or none does and every bad row is named. */
export function ReadingsCsvForm({ pourId }: { pourId: string }) {
  const inputId = useId();
  const hintId = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [asked, setAsked] = useState<{ message: string; csvText: string } | null>(null);
  const upload = useUploadReadingsCsv(pourId);
  const rowProblems = isApiError(upload.error) && upload.error.code === 'csv_invalid' ? csvRowProblems(upload.error.fields) : [];

  const onSubmit = async (event: React.FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setProblem(null);
    upload.reset();
    const file = fileRef.current?.files?.[0];
    if (!file) {
      setProblem('Choose the temperature log (a CSV file) first.');
      return;
    }
    if (file.size > maxCsvBytes) {
      setProblem('That file is larger than 2 MB; export a shorter stretch of the log.');
      return;
    }
    await send(await file.text(), false);
  };

  const send = async (csvText: string, confirmUnusual: boolean) => {
    setAsked(null);
    try {
      await upload.mutateAsync({ csvText, confirmUnusual });
      if (fileRef.current) fileRef.current.value = '';
    } catch (error) {
      // Questions about unusual values are answered here; other errors are shown below from the mutation's own error.
      if (isApiError(error) && error.code === 'confirmation_needed') setAsked({ message: error.message, csvText });
    }
  };

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Upload a temperature log" className="flex flex-col gap-3">
      <div className="flex flex-col gap-1.5">
        <label htmlFor={inputId} className="text-base font-semibold text-ink">
          Temperature log (CSV)
        </label>
        <p id={hintId} className="text-sm text-ink-soft">
          One reading per row as <code>time,tempC</code>, e.g. <code>2026-03-01T18:30:00Z,21.5</code>; times with Z or an offset. A log whose header says{' '}
          <code>tempF</code> is read in °F and converted.
        </p>
        <input
          ref={fileRef}
          id={inputId}
          type="file"
          accept=".csv,text/csv"
          aria-describedby={hintId}
          className="min-h-12 rounded-lg border border-line-strong bg-white p-2 file:mr-3 file:min-h-10 file:rounded-md file:border-0 file:bg-walnut-100 file:px-3 file:font-semibold"
        />
        {problem ? <FieldError>{problem}</FieldError> : null}
      </div>
      {asked ? (
        <UnusualValueQuestion
          message={asked.message}
          confirmLabel="Import it as it is"
          busy={upload.isPending}
          onConfirm={() => void send(asked.csvText, true)}
        />
      ) : rowProblems.length > 0 ? (
        <Alert tone="error" title="Nothing was imported" live="alert">
          <p>Every row must be readable before any is imported. Fix these rows in the file and import it again:</p>
          <ul className="mt-2 flex list-disc flex-col gap-1 pl-5">
            {rowProblems.map((p) => (
              <li key={p.label}>
                <strong>{p.row === null ? p.label : `Row ${p.row}`}:</strong> {p.message}
              </li>
            ))}
          </ul>
        </Alert>
      ) : upload.isError && !(isApiError(upload.error) && upload.error.code === 'confirmation_needed') ? (
        <ErrorAlert error={upload.error} />
      ) : null}
      {upload.isSuccess ? (
        <Alert tone="success">
          {upload.data.added === 1 ? '1 reading imported' : `${upload.data.added} readings imported`}
          {upload.data.unit === 'F' ? ' (read in °F and converted to °C)' : ''}
          {upload.data.duplicates > 0 ? `; ${upload.data.duplicates} were already in the log.` : '.'}
        </Alert>
      ) : null}
      <div>
        <Button type="submit" variant="secondary" className="min-h-12!" busy={upload.isPending} busyLabel="Importing…">
          Import the log
        </Button>
      </div>
    </form>
  );
}
