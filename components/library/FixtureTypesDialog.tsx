'use client';

import { useEffect, useRef, useState } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import type { PhotometryDistribution } from '@/lib/formats';
import {
  FIXTURE_CATEGORIES,
  LIBRARY,
  addFixtureType,
  addLibraryFixtureType,
  measuredTypeDraft,
} from '@/lib/plot';
import { ImportPreview } from './ImportPreview';
import { ShowTypeRow } from './ShowTypeRow';
import { type ImportOutcome, importPhotometryFile } from './readPhotometryBlob';
import './library.css';

const CATEGORY_TITLES: Record<(typeof FIXTURE_CATEGORIES)[number], string> = {
  profile: 'Profile spots',
  fresnel: 'Fresnels',
  par: 'PAR-type oval beams',
  wash: 'LED washes',
  followspot: 'Follow spots',
  soft: 'Soft panels and soft boxes',
  other: 'Other',
};

/**
 * The show's fixture types and where new ones come from: the built-in library, and photometric files
 * (IES LM-63 .ies, EULUMDAT .ldt) chosen here or dropped anywhere on the page.
 */
export function FixtureTypesDialog({
  initial,
  onClose,
}: {
  initial: ImportOutcome | null;
  onClose: () => void;
}) {
  const { document, run } = useEditor();
  const [preview, setPreview] = useState<PhotometryDistribution | null>(
    initial?.ok ? initial.distribution : null,
  );
  const [problem, setProblem] = useState<string | null>(initial && !initial.ok ? initial.message : null);
  const [notice, setNotice] = useState<string | null>(null);
  const closeButton = useRef<HTMLButtonElement>(null);

  const load = async (chosen: File) => {
    setNotice(null);
    const outcome = await importPhotometryFile(chosen);
    if (outcome.ok) {
      setPreview(outcome.distribution);
      setProblem(null);
    } else {
      setPreview(null);
      setProblem(outcome.message);
    }
  };

  useEffect(() => {
    closeButton.current?.focus();
  }, []);

  const addImported = (choices: { name: string; category: (typeof FIXTURE_CATEGORIES)[number] }) => {
    if (!preview) return;
    const result = run(addFixtureType, measuredTypeDraft(preview, choices));
    if (result.ok) {
      setNotice(`Added ${choices.name} to the show.`);
      setPreview(null);
    } else {
      setProblem(result.message);
    }
  };

  return (
    <div
      className="library-backdrop"
      onMouseDown={(event) => event.target === event.currentTarget && onClose()}
    >
      <div
        className="library-dialog"
        role="dialog"
        aria-modal="true"
        aria-labelledby="library-title"
        onKeyDown={(event) => {
          if (event.key === 'Escape') onClose();
        }}
      >
        <header className="library-header">
          <h2 id="library-title">Fixture types</h2>
          <button type="button" ref={closeButton} onClick={onClose}>
            Close
          </button>
        </header>

        <section aria-labelledby="library-import">
          <h3 id="library-import">Import a photometric file</h3>
          <div
            className="library-drop"
            data-drop-zone
            onDragOver={(event) => event.preventDefault()}
            onDrop={(event) => {
              event.preventDefault();
              event.stopPropagation();
              const dropped = event.dataTransfer.files[0];
              if (dropped) void load(dropped);
            }}
          >
            <p>
              Drop an IES LM-63 (.ies) or EULUMDAT (.ldt) file here or anywhere on the page, or{' '}
              <label className="library-file-label">
                choose one
                <input
                  type="file"
                  accept=".ies,.ldt,.IES,.LDT"
                  aria-label="Choose a photometric file"
                  onChange={(event) => {
                    const chosen = event.target.files?.[0];
                    if (chosen) void load(chosen);
                    event.target.value = '';
                  }}
                />
              </label>
              .
            </p>
          </div>
          {problem ? (
            <p className="panel-problem" role="alert" data-import-problem>
              {problem}
            </p>
          ) : null}
          {notice ? <p className="panel-note">{notice}</p> : null}
          {preview ? (
            <ImportPreview
              key={preview.originalText.length + preview.fileName}
              distribution={preview}
              onAdd={addImported}
              onCancel={() => setPreview(null)}
            />
          ) : null}
        </section>

        <section aria-labelledby="library-show">
          <h3 id="library-show">In this show ({document.fixtureTypes.length})</h3>
          <ul className="type-list">
            {document.fixtureTypes.map((type) => (
              <ShowTypeRow key={type.id} type={type} />
            ))}
          </ul>
        </section>

        <section aria-labelledby="library-builtin">
          <h3 id="library-builtin">Library</h3>
          <p className="panel-note">
            Generic types with typical values, from memory — not any maker’s data. Add one, then edit it to
            match your units.
          </p>
          {FIXTURE_CATEGORIES.map((category) => {
            const entries = LIBRARY.filter((entry) => entry.type.category === category);
            if (entries.length === 0) return null;
            return (
              <div key={category} className="library-group">
                <h4>{CATEGORY_TITLES[category]}</h4>
                <ul className="type-list">
                  {entries.map((entry) => (
                    <li key={entry.libraryId} className="type-row" data-library-id={entry.libraryId}>
                      <span>{entry.type.name}</span>
                      <button
                        type="button"
                        className="panel-button"
                        onClick={() => {
                          if (run(addLibraryFixtureType, { libraryId: entry.libraryId }).ok) {
                            setNotice(`Added ${entry.type.name} to the show.`);
                          }
                        }}
                      >
                        Add
                      </button>
                    </li>
                  ))}
                </ul>
              </div>
            );
          })}
        </section>
      </div>
    </div>
  );
}
