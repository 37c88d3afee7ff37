// "Workbook (xlsx)" and "Table (CSV)" for a study or a comparison: each shows that the file is
// being prepared (a study workbook takes a moment) and says what went wrong if it fails.
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';
import { downloadFile, exportPaths, type ExportKind } from '../api/download-file';

export type ExportButtonsProps = { kind: 'study' | 'comparison'; id: string; name: string };

const labels: Record<ExportKind, string> = { xlsx: 'Workbook (xlsx)', csv: 'Table (CSV)' };

export function ExportButtons({ kind, id, name }: ExportButtonsProps) {
  const [busy, setBusy] = useState<ExportKind | null>(null);
  const toast = useToast();
  const save = (file: ExportKind) => {
    setBusy(file);
    downloadFile(exportPaths[kind](id, file), `${name}.${file}`)
      .catch((e: Error) =>
        toast.show(
          `The ${file === 'xlsx' ? 'workbook' : 'CSV file'} could not be made: ${e.message}`,
          'error',
        ),
      )
      .finally(() => setBusy(null));
  };
  return (
    <div role="group" aria-label="Export" className="no-print flex items-center gap-1.5">
      {(['xlsx', 'csv'] as const).map((file) => (
        <Button key={file} size="sm" busy={busy === file} onClick={() => save(file)}>
          {busy === file ? 'Preparing…' : labels[file]}
        </Button>
      ))}
    </div>
  );
}
