import { useId, useState, type DragEvent } from 'react';

/**
 * Files can be dropped here or chosen with the ordinary file picker the label opens; the picker keeps it usable
 * from a keyboard and on phones, where there is nothing to drag.
 */
export function DropZone({ onFiles }: { onFiles: (files: File[]) => void }) {
  const id = useId();
  const [over, setOver] = useState(false);
  const take = (list: FileList | null) => {
    if (list && list.length) onFiles(Array.from(list));
  };
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    take(e.dataTransfer.files);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      className={`rounded-lg border-2 border-dashed p-6 text-center transition-colors ${over ? 'border-moss bg-moss-light' : 'border-slate/40 bg-white'}`}
    >
      <p className="mb-3 font-semibold text-slate-deep">Drop logger files here</p>
      <label htmlFor={id} className="inline-flex min-h-11 cursor-pointer items-center rounded-md bg-slate px-4 py-2 font-semibold text-paper hover:bg-slate-deep focus-within:outline-2">
        Choose files…
      </label>
      <input
        id={id}
        type="file"
        multiple
        accept=".csv,.txt,.tsv,text/csv,text/plain"
        className="sr-only"
        onChange={(e) => {
          take(e.currentTarget.files);
          e.currentTarget.value = '';
        }}
      />
      <p className="mt-3 text-sm text-ink-soft">CSV or text exports, up to 256 MB each. Nothing is stored until you confirm.</p>
    </div>
  );
}
