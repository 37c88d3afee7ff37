// The import of a reader file, in two steps: the file is sent to be read (nothing stored) and what
// was found is shown; the scientist picks the blocks and says what they are; the same file is sent
// again with that choice and stored in one transaction.
import { useRef, useState } from 'react';
import type { ImportPreview } from '@shared/schemas/plates-types';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { formatDateTime } from '@/lib/format';
import type { UploadProgress } from '@/lib/upload';
import { useImportReads, type ImportResult } from '../api/import-reads';
import { usePreviewImport } from '../api/preview-import';
import {
  buildSelection,
  initialChoice,
  initialSeries,
  type BlockChoice,
  type SeriesChoice,
} from '../utils/selection';
import { BlockCard } from './block-card';
import { FileDrop, formatBytes } from './file-drop';
import { SeriesSettings } from './series-settings';

export type ImportReaderFileProps = {
  plateId: string;
  plateFormat: 96 | 384;
  onImported: (result: ImportResult, fileName: string) => void;
  onCancel: () => void;
};

export function ImportReaderFile({ plateId, plateFormat, onImported, onCancel }: ImportReaderFileProps) {
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [refused, setRefused] = useState<string | null>(null);
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [choices, setChoices] = useState<BlockChoice[]>([]);
  const [series, setSeries] = useState<SeriesChoice>(initialSeries);
  const abort = useRef<AbortController | null>(null);
  const read = usePreviewImport();
  const store = useImportReads({ onSuccess: (result, input) => onImported(result, input.file.name) });

  const start = (f: File) => {
    setRefused(null);
    setFile(f);
    setPreview(null);
    setProgress(null);
    store.reset();
    abort.current = new AbortController();
    read.mutate(
      { plateId, file: f, onProgress: setProgress, signal: abort.current.signal },
      {
        onSuccess: (p) => {
          setPreview(p);
          setChoices(p.blocks.map(initialChoice));
          setSeries(initialSeries);
        },
      },
    );
  };
  const built = preview ? buildSelection(preview.blocks, choices, series) : null;
  const confirm = () => {
    if (!file || !built?.ok) return;
    setProgress(null);
    abort.current = new AbortController();
    store.mutate({
      plateId,
      file,
      selection: built.selection,
      onProgress: setProgress,
      signal: abort.current.signal,
    });
  };
  const busy = read.isPending || store.isPending;
  const seriesCount = preview
    ? preview.blocks.filter(
        (b) => choices[b.index]?.include && choices[b.index]?.asSeries && b.kind === 'endpoint',
      ).length
    : 0;
  const failure = refused ?? (read.error && read.error.name !== 'AbortError' ? read.error.message : null);

  return (
    <div className="space-y-4">
      {!busy && <FileDrop onFile={start} onRefused={setRefused} compact={preview !== null} />}
      {failure && (
        <Notice tone="error" title={file ? `${file.name} could not be read` : 'That file cannot be sent'}>
          {failure}
        </Notice>
      )}
      {busy && (
        <div className="space-y-2 rounded border border-line bg-surface p-4">
          <ProgressBar
            fraction={progress?.fraction ?? 0}
            label={read.isPending ? `Sending ${file?.name} to be read…` : `Importing ${file?.name}…`}
            detail={
              progress ? `${formatBytes(progress.loaded)} of ${formatBytes(progress.total)}` : undefined
            }
          />
          {progress?.fraction === 1 && (
            <p className="text-sm text-ink-muted">Sent; the server is reading the file…</p>
          )}
          <Button size="sm" onClick={() => abort.current?.abort()}>
            Cancel
          </Button>
        </div>
      )}
      {preview && file && !read.isPending && (
        <div className="space-y-3">
          <section
            aria-label="The file"
            className="flex flex-wrap items-baseline gap-x-6 gap-y-1 rounded border border-line bg-surface px-3 py-2"
          >
            <span className="font-semibold">{preview.fileName}</span>
            <span className="text-ink-muted">{formatBytes(preview.sizeBytes)}</span>
            <span className="text-ink-muted">
              {preview.fileType === 'xlsx' ? 'Excel workbook' : 'Text table'}
            </span>
            <span className="font-mono text-sm text-ink-muted" title={preview.sha256}>
              SHA-256 {preview.sha256.slice(0, 12)}…
            </span>
            <span>
              {preview.blocks.length} block{preview.blocks.length === 1 ? '' : 's'} found
            </span>
          </section>
          {preview.duplicates.length > 0 && (
            <Notice tone="warning" title="This very file was imported before">
              <ul>
                {preview.duplicates.map((d) => (
                  <li key={`${d.plateId}-${d.uploadedAt}`}>
                    on {formatDateTime(d.uploadedAt)} by {d.uploadedBy} into{' '}
                    {d.plateId === plateId ? 'this plate (importing it again here is refused)' : d.plateName}
                  </li>
                ))}
              </ul>
            </Notice>
          )}
          {preview.notes.length > 0 && (
            <Notice title="Notes from reading the file">
              <ul className="list-disc pl-5">
                {preview.notes.map((n, i) => (
                  <li key={i}>
                    {[n.sheet && `sheet ${n.sheet}`, n.cell && `cell ${n.cell}`].filter(Boolean).join(', ')}
                    {(n.sheet || n.cell) && ': '}
                    {n.message}
                  </li>
                ))}
              </ul>
            </Notice>
          )}
          {preview.blocks.map((b) => (
            <BlockCard
              key={b.index}
              block={b}
              plateFormat={plateFormat}
              choice={choices[b.index]}
              onChange={(c) => setChoices((all) => all.map((x, i) => (i === b.index ? c : x)))}
            />
          ))}
          {seriesCount > 0 && <SeriesSettings count={seriesCount} series={series} onChange={setSeries} />}
          {store.error && store.error.name !== 'AbortError' && (
            <Notice tone="error" title="Nothing was imported">
              {store.error.message}
            </Notice>
          )}
          <div className="sticky bottom-0 flex items-center gap-3 border-t border-line bg-canvas py-3">
            <Button
              variant="primary"
              disabled={!built?.ok || store.isPending}
              busy={store.isPending}
              onClick={confirm}
            >
              {built?.ok ? `Import ${built.reads} read${built.reads === 1 ? '' : 's'}` : 'Import'}
            </Button>
            <Button onClick={onCancel}>Cancel</Button>
            {built && !built.ok && <span className="text-warn-800">{built.message}</span>}
          </div>
        </div>
      )}
    </div>
  );
}
