// Choosing a reader file: a drop area and a file button. The 20 MB cap is said up front and
// checked before anything is sent; the content, not the name, decides how the file is read.
import { useId, useState } from 'react';
import { maxUploadBytes } from '@/lib/upload';

export type FileDropProps = {
  onFile: (file: File) => void;
  onRefused: (message: string) => void;
  disabled?: boolean;
  /** A slim bar once a file has been read (to choose another). */
  compact?: boolean;
};

export const formatBytes = (n: number) =>
  n >= 1024 * 1024
    ? `${(n / 1024 / 1024).toFixed(1)} MB`
    : n >= 1024
      ? `${(n / 1024).toFixed(0)} kB`
      : `${n} bytes`;

export function FileDrop({ onFile, onRefused, disabled, compact }: FileDropProps) {
  const id = useId();
  const [over, setOver] = useState(false);
  const take = (file: File | undefined) => {
    if (!file) return;
    if (file.size > maxUploadBytes)
      return onRefused(`${file.name} is ${formatBytes(file.size)}; the limit is 20 MB.`);
    if (file.size === 0) return onRefused(`${file.name} is empty.`);
    onFile(file);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={(e) => {
        e.preventDefault();
        setOver(false);
        if (!disabled) take(e.dataTransfer.files[0]);
      }}
      className={`rounded-md border-2 border-dashed ${compact ? 'px-4 py-2' : 'px-6 py-8 text-center'} ${over ? 'border-accent-600 bg-accent-50' : 'border-line-strong bg-surface'}`}
    >
      {compact ? (
        <label htmlFor={id} className="flex cursor-pointer items-center gap-3 text-ink-muted">
          <span className="inline-flex h-7 items-center rounded border border-line-strong bg-surface px-2.5 text-sm font-semibold text-ink hover:bg-canvas">
            Choose another file
          </span>
          or drop one here (xlsx, csv, tsv or txt, up to 20 MB)
        </label>
      ) : (
        <label htmlFor={id} className="cursor-pointer">
          <span className="block text-base font-semibold">Drop a reader file here, or choose one</span>
          <span className="mt-1 block text-ink-muted">
            xlsx, csv, tsv or txt exports of a plate reader, up to 20 MB. Bellwether reads the content,
            whatever the file is called.
          </span>
          <span className="mt-3 inline-flex h-9 items-center rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800">
            Choose a file
          </span>
        </label>
      )}
      <input
        id={id}
        type="file"
        aria-label="Reader file"
        className="sr-only"
        disabled={disabled}
        onChange={(e) => {
          take(e.target.files?.[0]);
          e.target.value = '';
        }}
      />
    </div>
  );
}
