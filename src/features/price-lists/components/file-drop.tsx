import { useDropzone, type FileRejection } from 'react-dropzone';
import { useState } from 'react';
import { Button } from '@/components/ui/button';

const ACCEPT = {
  'text/csv': ['.csv'],
  'text/plain': ['.txt'],
  'text/tab-separated-values': ['.tsv'],
};

function rejectionMessage(rejections: FileRejection[]): string {
  if (rejections.length > 1) return 'Drop one file at a time.';
  const name = rejections[0]?.file.name ?? 'That file';
  return `${name} is not a .csv, .txt or .tsv file.`;
}

/**
 * Takes one supplier file, dropped or chosen. The drop area itself is not clickable, so the one
 * way in by keyboard is the real button inside it.
 */
export function FileDrop({ disabled, onFile }: { disabled: boolean; onFile: (file: File) => void }) {
  const [refused, setRefused] = useState<string | null>(null);
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    accept: ACCEPT,
    multiple: false,
    disabled,
    noClick: true,
    noKeyboard: true,
    onDrop: (accepted, rejections) => {
      if (rejections.length > 0) {
        setRefused(rejectionMessage(rejections));
        return;
      }
      const file = accepted[0];
      if (file) {
        setRefused(null);
        onFile(file);
      }
    },
  });

  return (
    <div className="flex flex-col gap-2">
      <div
        {...getRootProps()}
        className={`flex flex-col items-center justify-center gap-2 rounded-lg border-2 border-dashed px-4 py-6 text-center ${
          disabled
            ? 'border-ink/10 bg-paper-sunk/50 text-ink-faint'
            : isDragActive
              ? 'border-accent bg-accent-soft'
              : 'border-ink/20 bg-paper'
        }`}
      >
        <input {...getInputProps()} aria-label="Price-list file" />
        <svg aria-hidden viewBox="0 0 24 24" className="h-7 w-7 text-ink-faint" fill="none" stroke="currentColor" strokeWidth="1.6">
          <path d="M12 16V4m0 0-4 4m4-4 4 4M4 16v3a1 1 0 0 0 1 1h14a1 1 0 0 0 1-1v-3" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
        <p className="text-[15px] text-ink">{isDragActive ? 'Let go to upload' : 'Drop the supplier’s file here'}</p>
        <Button variant="secondary" onClick={open} disabled={disabled}>
          Choose file…
        </Button>
        <p className="text-xs text-ink-soft">CSV, TSV or text; comma, semicolon or tab separated</p>
      </div>
      {refused && (
        <p role="alert" className="text-sm text-nogo">
          {refused}
        </p>
      )}
    </div>
  );
}
