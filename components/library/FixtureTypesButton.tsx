'use client';

import { useEffect, useState } from 'react';
import { FixtureTypesDialog } from './FixtureTypesDialog';
import { type ImportOutcome, importPhotometryFile, isPhotometryFileName } from './readPhotometryBlob';

/**
 * The toolbar's way into the fixture types: a button that opens the dialog, and a page-wide drop
 * target that opens it with a dropped .ies or .ldt file (other drops are left alone).
 */
export function FixtureTypesButton() {
  const [open, setOpen] = useState(false);
  const [dropped, setDropped] = useState<{ outcome: ImportOutcome; count: number } | null>(null);

  useEffect(() => {
    const hasFiles = (event: DragEvent) => Array.from(event.dataTransfer?.types ?? []).includes('Files');
    const onDragOver = (event: DragEvent) => {
      if (hasFiles(event)) event.preventDefault();
    };
    const onDrop = (event: DragEvent) => {
      const dropped = event.dataTransfer?.files[0];
      // The dialog's own drop zone reads its drops itself.
      if (!dropped || !isPhotometryFileName(dropped.name) || event.defaultPrevented) return;
      event.preventDefault();
      void importPhotometryFile(dropped).then((outcome) => {
        setDropped((last) => ({ outcome, count: (last?.count ?? 0) + 1 }));
        setOpen(true);
      });
    };
    window.addEventListener('dragover', onDragOver);
    window.addEventListener('drop', onDrop);
    return () => {
      window.removeEventListener('dragover', onDragOver);
      window.removeEventListener('drop', onDrop);
    };
  }, []);

  return (
    <>
      <button
        type="button"
        onClick={() => setOpen(true)}
        title="The show's fixture types, the library, and photometric files"
      >
        Fixture types
      </button>
      {open ? (
        <FixtureTypesDialog
          key={dropped?.count ?? 0}
          initial={dropped?.outcome ?? null}
          onClose={() => {
            setOpen(false);
            setDropped(null);
          }}
        />
      ) : null}
    </>
  );
}
