// Choosing or dropping a CSV of measured cycle times. The size and type are checked here first so an
// obvious mistake is told at once; the server checks everything again and its messages are shown as they come.
import { useId, useState, type DragEvent } from 'react';
import { TIME_STUDY_LIMITS, type TimeStudyDetail } from '../../../../shared/api/time-studies';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Spinner } from '../../../components/ui/spinner';
import { isApiRequestError } from '../../../lib/api-client';
import { useUploadTimeStudy } from '../api/upload-time-study';

interface TimeStudyUploadProps {
  scenarioId: string;
  stationId: string;
  onUploaded: (study: TimeStudyDetail) => void;
}

function formatSize(bytes: number): string {
  return bytes >= 1024 * 1024
    ? `${(bytes / (1024 * 1024)).toFixed(1).replace(/\.0$/, '')} MB`
    : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

/** The same rules the server applies first, worded alike. */
function localProblem(file: File): string | null {
  const lower = file.name.toLowerCase();
  if (!TIME_STUDY_LIMITS.extensions.some((ext) => lower.endsWith(ext)))
    return `"${file.name}" is not a CSV or text file; upload the measured cycle times as a .csv or .txt file.`;
  if (file.size > TIME_STUDY_LIMITS.fileBytes)
    return `The file is ${formatSize(file.size)}; the limit is ${formatSize(TIME_STUDY_LIMITS.fileBytes)}. Split the time study or thin it out.`;
  return null;
}

export function TimeStudyUpload({ scenarioId, stationId, onUploaded }: TimeStudyUploadProps) {
  const inputId = useId();
  const hintId = useId();
  const upload = useUploadTimeStudy();
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);

  const send = (chosen: File | undefined) => {
    if (!chosen) return;
    setFile(chosen);
    upload.reset();
    const local = localProblem(chosen);
    setProblem(local);
    if (local) return;
    upload.mutate({ scenarioId, stationId, file: chosen }, { onSuccess: onUploaded });
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    send(event.dataTransfer.files[0]);
  };

  const error = upload.error;
  // The server's message often lists the field problems already; list only what it leaves out, so
  // no rejection reads twice.
  const fieldMessages =
    isApiRequestError(error) && error.fields.length > 1
      ? error.fields
          .filter((f) => f.message && !error.message.includes(f.message))
          .map((f) => `${f.path}: ${f.message}`)
      : [];

  return (
    <div className="flex flex-col gap-3">
      <div
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={`flex flex-col gap-2 rounded-md border-2 border-dashed p-4 ${dragging ? 'border-accent bg-accent-soft' : 'border-ink-faint/50'}`}
      >
        <label htmlFor={inputId} className="font-semibold text-ink">
          Upload a time study (CSV)
        </label>
        <input
          id={inputId}
          type="file"
          accept=".csv,.txt,text/csv,text/plain"
          aria-describedby={hintId}
          disabled={upload.isPending}
          onChange={(event) => {
            send(event.currentTarget.files?.[0]);
            event.currentTarget.value = '';
          }}
        />
        <p id={hintId} className="text-sm text-ink-soft">
          Drop a file here or choose one: one measured cycle time in seconds per row, in a column named like cycle,
          seconds or time (or the only numeric column). Comma, semicolon or tab separated; a decimal comma is fine. At
          most {formatSize(TIME_STUDY_LIMITS.fileBytes)} and {TIME_STUDY_LIMITS.rows.toLocaleString('en-GB')} rows.
        </p>
      </div>
      {upload.isPending && file && (
        <Spinner label={`Uploading and analysing ${file.name} (${formatSize(file.size)})…`} />
      )}
      {problem && <ErrorBanner title="This file cannot be used.">{problem}</ErrorBanner>}
      {error && (
        <ErrorBanner title={`${file?.name ?? 'The file'} was not accepted.`}>
          <p>{error.message}</p>
          {fieldMessages.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {fieldMessages.map((message) => (
                <li key={message}>{message}</li>
              ))}
            </ul>
          )}
        </ErrorBanner>
      )}
    </div>
  );
}
