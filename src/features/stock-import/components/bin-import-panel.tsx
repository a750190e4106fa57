import { useId, useState, type ChangeEvent } from 'react';
import { Link } from 'react-router';
import { MAX_IMPORT_CSV_CHARS, type ImportResult } from '@shared/schemas/bin-import';
import { decodeCsvBytes } from '@shared/stock/csv-text';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { messageOf } from '@/lib/errors';
import { useCommitImport } from '../api/commit-import';
import { usePreviewImport } from '../api/preview-import';
import { TEMPLATE_CSV_URL } from '../utils/csv-links';
import { importLabel } from '../utils/preview-words';
import { ImportPreviewTable } from './import-preview-table';

const MAX_PROBLEMS_LISTED = 10;

const listCodes = (codes: readonly string[]) => (codes.length <= 6 ? codes.join(', ') : `${codes.slice(0, 5).join(', ')} and ${codes.length - 5} more`);
const bins = (n: number) => `${n} ${n === 1 ? 'bin' : 'bins'}`;

function Imported({ result }: { result: ImportResult }) {
  const title = [result.created.length > 0 && `Added ${bins(result.created.length)}`, result.updated.length > 0 && `updated ${bins(result.updated.length)}`].filter(Boolean).join(', ');
  return (
    <Notice tone="ok" title={title.charAt(0).toUpperCase() + title.slice(1)}>
      {result.created.length > 0 && <p>New: {listCodes(result.created)}.</p>}
      {result.updated.length > 0 && <p>Updated: {listCodes(result.updated)}.</p>}
      {result.unchanged > 0 && <p>{bins(result.unchanged)} in the file already matched and stayed as they were.</p>}
      <p>
        <Link to="/bins" className="font-semibold underline underline-offset-4">
          Open the bins
        </Link>
      </p>
    </Notice>
  );
}

function ImportRefused({ error }: { error: unknown }) {
  const issues = error instanceof ApiError ? error.issues : [];
  return (
    <Notice tone="bad" title="Nothing was imported">
      <p>{messageOf(error)}</p>
      {issues.length > 0 && (
        <ul className="mt-2 list-disc pl-5">
          {issues.slice(0, MAX_PROBLEMS_LISTED).map((i) => (
            <li key={i.path + i.message}>{i.message}</li>
          ))}
        </ul>
      )}
    </Notice>
  );
}

/**
 * Choose or paste a bins CSV, check it row by row, then import all of it in one go: new bins, and
 * updates to the bins whose codes the file names. Import is offered only for the text that was
 * checked, only when every row is ready, and only when something would change.
 */
export function BinImportPanel({ onImported }: { onImported?: (result: ImportResult) => unknown }) {
  const ids = useId();
  const [csv, setCsv] = useState('');
  const [readProblem, setReadProblem] = useState<string>();
  const [readNote, setReadNote] = useState<string>();
  const check = usePreviewImport();
  const commit = useCommitImport(onImported);
  const preview = check.data && check.variables?.csv === csv ? check.data : undefined;
  const nothingToDo = preview !== undefined && !preview.canImport && preview.fileErrors.length === 0 && preview.counts.problem === 0 && preview.rows.length > 0;

  const edit = (text: string) => {
    setCsv(text);
    setReadProblem(undefined);
    setReadNote(undefined);
    commit.reset();
  };

  const chooseFile = async (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    e.target.value = '';
    if (!file) return;
    if (file.size > MAX_IMPORT_CSV_CHARS) return setReadProblem(`${file.name} is larger than 2 MB. Split it into smaller files.`);
    const decoded = decodeCsvBytes(new Uint8Array(await file.arrayBuffer()));
    if ('problem' in decoded) return setReadProblem(`${file.name}: ${decoded.problem}`);
    edit(decoded.text);
    if (decoded.encoding === 'windows-1252') setReadNote(`${file.name} is not UTF-8; it was read as Windows-1252 text. Check the accented letters in the preview.`);
  };

  const runImport = () =>
    commit.mutate(
      { csv },
      {
        onSuccess: () => {
          setCsv('');
          check.reset();
        },
      },
    );

  return (
    <div className="flex flex-col gap-4">
      <p>
        One line per bin, with a header line of column names.{' '}
        <a href={TEMPLATE_CSV_URL} download className="inline-target font-semibold underline underline-offset-4">
          Download a template
        </a>{' '}
        with every column and two example bins, or export the bins below, change them in a spreadsheet and bring the file back. A row
        with the code of a bin updates that bin; leave the code empty to add a new bin with the next free code. Stock on hand never
        changes here: count a bin to correct it.
      </p>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={`${ids}-file`} className="text-sm font-semibold">
          CSV file
        </label>
        <input id={`${ids}-file`} type="file" accept=".csv,text/csv" onChange={(e) => void chooseFile(e)} className="min-h-12 text-base file:mr-3 file:min-h-12 file:rounded-lg file:border-2 file:border-ink file:bg-card file:px-4 file:font-semibold" />
      </div>
      <TextAreaField label="Or paste the CSV here" value={csv} onChange={(e) => edit(e.target.value)} rows={6} spellCheck={false} className="font-mono" />
      {readProblem && <Notice tone="bad">{readProblem}</Notice>}
      {readNote && <Notice tone="warn">{readNote}</Notice>}
      {check.error && <Notice tone="bad">{messageOf(check.error)}</Notice>}
      <div className="flex flex-wrap gap-3">
        <Button variant="secondary" busy={check.isPending} disabled={csv.trim() === ''} onClick={() => check.mutate({ csv })}>
          Check file
        </Button>
        <Button busy={commit.isPending} disabled={!preview?.canImport} onClick={runImport}>
          {preview?.canImport ? importLabel(preview) : 'Import bins'}
        </Button>
      </div>
      {nothingToDo ? (
        <Notice title="Nothing to import">Every row of the file already matches its bin.</Notice>
      ) : (
        !preview?.canImport && csv.trim() !== '' && <p className="text-sm text-ink-soft">Import opens once the file is checked and every row is ready.</p>
      )}
      {commit.error && <ImportRefused error={commit.error} />}
      {commit.data && <Imported result={commit.data} />}
      {preview && preview.fileErrors.length > 0 && (
        <Notice tone="bad" title="Problems with the file">
          <ul className="list-disc pl-5">
            {preview.fileErrors.map((e) => (
              <li key={e.message}>{e.message}</li>
            ))}
          </ul>
        </Notice>
      )}
      {preview && preview.rows.length > 0 && <ImportPreviewTable key={check.submittedAt} preview={preview} />}
    </div>
  );
}
