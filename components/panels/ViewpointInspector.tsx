'use client';

import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import {
  type CameraSettings,
  type Viewpoint,
  deleteViewpoint,
  setMainViewpoint,
  updateViewpoint,
} from '@/lib/plot';
import { CameraFields } from './CameraFields';
import { PanelSection } from './PanelSection';
import { PointFields } from './PointFields';
import { outcomeOf } from './format';

/** Starting settings when a viewpoint becomes a camera (common practice, no source): ISO 800, 180° at 25 fps, f/2.8. */
const NEW_CAMERA: CameraSettings = {
  iso: 800,
  shutter: { kind: 'angle', angleDeg: 180, framesPerSecond: 25 },
  fNumber: 2.8,
  meterConstant: 250,
};

/** Where the audience sits or a camera stands, and a camera's exposure settings. */
export function ViewpointInspector({ id }: { id: string }) {
  const { document, run, select, units } = useEditor();
  const view = document.viewpoints.find((candidate) => candidate.id === id);
  if (!view) return null;
  const edit = (changes: Partial<Omit<Viewpoint, 'id'>>) => outcomeOf(run(updateViewpoint, { id, changes }));
  const isMain = document.mainViewpointId === id;
  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Viewpoint</span> {view.name}
      </h2>
      <PanelSection title="Viewpoint">
        <TextInput label="Name" value={view.name} onCommit={(name) => edit({ name })} />
        <SelectInput
          label="Kind"
          value={view.kind}
          options={[
            { value: 'audience', label: 'Audience' },
            { value: 'camera', label: 'Camera' },
          ]}
          onCommit={(kind) =>
            edit(kind === 'camera' ? { kind, camera: view.camera ?? NEW_CAMERA } : { kind, camera: null })
          }
        />
        <PointFields
          name={view.kind === 'camera' ? 'Lens' : 'Eye'}
          point={view.position}
          axes={['x', 'y', 'z']}
          units={units}
          onCommit={(position) => edit({ position })}
        />
        {isMain ? (
          <p className="panel-note">This is the main viewpoint: faces are judged as seen from here.</p>
        ) : (
          <button type="button" className="panel-button" onClick={() => run(setMainViewpoint, { id })}>
            Make this the main viewpoint
          </button>
        )}
      </PanelSection>
      {view.kind === 'camera' && view.camera ? (
        <PanelSection title="Camera">
          <CameraFields camera={view.camera} onChange={(camera) => edit({ camera })} />
        </PanelSection>
      ) : null}
      <PanelSection title="Remove">
        <button
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => {
            if (run(deleteViewpoint, { id }).ok) select([]);
          }}
        >
          Delete this viewpoint
        </button>
      </PanelSection>
    </>
  );
}
