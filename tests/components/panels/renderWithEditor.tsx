import { act, render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { type EditorApi, EditorProvider, useEditor } from '@/components/editor/EditorContext';
import type { PlotDocument } from '@/lib/plot';

/** Hands the live editor API to the test on every render. */
function Probe({ onRender }: { onRender: (api: EditorApi) => void }) {
  onRender(useEditor());
  return null;
}

/** Render `ui` inside an editor holding `document`; `editor()` is the latest API, `select` sets the selection. */
export function renderWithEditor(ui: ReactNode, document: PlotDocument) {
  let latest: EditorApi | null = null;
  const result = render(
    <EditorProvider initialDocument={document}>
      {ui}
      <Probe
        onRender={(api) => {
          latest = api;
        }}
      />
    </EditorProvider>,
  );
  const editor = (): EditorApi => {
    if (latest === null) throw new Error('the editor has not rendered');
    return latest;
  };
  return {
    ...result,
    editor,
    document: () => editor().store.getDocument(),
    select: (ids: readonly string[]) => act(() => editor().select(ids)),
  };
}
