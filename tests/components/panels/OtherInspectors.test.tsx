// @vitest-environment jsdom
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { Inspector } from '@/components/panels/Inspector';
import { tinyPlot, unit } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from './renderWithEditor';

afterEach(cleanup);

function enter(label: string, text: string) {
  const input = screen.getByLabelText(label);
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
  return input;
}

describe('show settings (nothing selected)', () => {
  it('edits the name, display units and focus-plane height', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Show Tiny');
    enter('Show name', 'The Tempest');
    enter('Venue', 'Studio 2');
    fireEvent.change(screen.getByLabelText('Display units'), { target: { value: 'imperial' } });
    // 4' 11" = 4 × 0.3048 + 11 × 0.0254 = 1.4986 m
    enter('Focus-plane height', `4' 11"`);
    const document = view.document();
    expect(document.name).toBe('The Tempest');
    expect(document.venue).toBe('Studio 2');
    expect(document.displayUnits).toBe('imperial');
    expect(document.focusPlaneHeightM).toBeCloseTo(1.4986, 12);
    expect((screen.getByLabelText('Focus-plane height') as HTMLInputElement).value).toBe(`4' 11"`);
  });

  it('shows the command refusing a focus plane above 10 m, beside the field', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    const before = view.document();
    enter('Focus-plane height', '12 m');
    expect(view.document()).toBe(before);
    expect(screen.getByRole('alert').textContent).toContain('must be between 0 and 10 m');
  });
});

describe('position inspector', () => {
  it('moving the trim moves its units', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['pos-1']);
    enter('Height (trim)', '7');
    expect(view.document().positions[0].heightM).toBe(7);
    expect(view.document().fixtures[0].mount.z).toBe(7);
  });

  it('lists its units and their weight against its rating', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['pos-1']);
    const units = within(screen.getByRole('region', { name: 'Units (1)' }));
    expect(units.getByRole('button').textContent).toBe('Front pipe #1 — Profile 26°, ch 1');
    // One 8 kg profile and the 1 kg allowance on a 200 kg pipe: 9 kg, 4.5 % (shown whole: 5 %).
    expect(screen.getByText(/Units' own weight/).textContent).toContain(
      "Units' own weight 8 kg + allowance 1 × 1 kg = 9 kg of 200 kg rated (5 %).",
    );
    fireEvent.click(units.getByRole('button'));
    expect(view.editor().selection).toEqual(['fx-1']);
  });

  it('an empty rated load means unknown; zero is refused', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['pos-1']);
    enter('Rated load', '0');
    expect(screen.getByRole('alert').textContent).toBe(
      '0 kg is out of range: enter a number above 0 up to 100000 kg, or leave it empty.',
    );
    expect(view.document().positions[0].ratedLoadKg).toBe(200);
    enter('Rated load', '');
    expect(view.document().positions[0].ratedLoadKg).toBeNull();
  });

  it('deleting a position with units asks what becomes of them; leaving them free keeps them', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['pos-1']);
    fireEvent.click(screen.getByRole('button', { name: 'Delete this position' }));
    const choice = screen.getByRole('group', {
      name: 'Front pipe holds 1 fixture. What should happen to it?',
    });
    expect(view.document().positions).toHaveLength(1);
    expect(document.activeElement).toBe(
      within(choice).getByRole('button', { name: 'Delete it with the position' }),
    );
    fireEvent.click(within(choice).getByRole('button', { name: 'Leave it standing free' }));
    expect(view.document().positions).toHaveLength(0);
    expect(view.document().fixtures[0]).toMatchObject({ id: 'fx-1', positionId: null, unit: null });
    expect(view.editor().selection).toEqual([]);
  });

  it('the choice can delete the units too, or be cancelled', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['pos-1']);
    fireEvent.click(screen.getByRole('button', { name: 'Delete this position' }));
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('group')).toBeNull();
    expect(view.document().positions).toHaveLength(1);
    fireEvent.click(screen.getByRole('button', { name: 'Delete this position' }));
    fireEvent.click(screen.getByRole('button', { name: 'Delete it with the position' }));
    expect(view.document().positions).toHaveLength(0);
    expect(view.document().fixtures).toHaveLength(0);
  });

  it('an empty position is deleted without a question', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot({ fixtures: [] }));
    view.select(['pos-1']);
    fireEvent.click(screen.getByRole('button', { name: 'Delete this position' }));
    expect(view.document().positions).toHaveLength(0);
  });
});

describe('subject inspector', () => {
  it('moves the mark and sets the facing', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['sub-1']);
    enter('Mark x', '-1.5');
    enter('Facing', '90');
    expect(view.document().subjects[0]).toMatchObject({ mark: { x: -1.5, y: 2 }, facingDeg: 90 });
    enter('Facing', '400');
    expect(screen.getByRole('alert').textContent).toContain('from -360 to 360°');
  });

  it('refuses a face height of zero with the command’s reason', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['sub-1']);
    const before = view.document();
    enter('Face height', '0');
    expect(view.document()).toBe(before);
    expect(screen.getByRole('alert').textContent).toContain('must be greater than 0 m');
  });

  it('is deleted from its panel', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['sub-1']);
    fireEvent.click(screen.getByRole('button', { name: 'Delete this subject' }));
    expect(view.document().subjects).toHaveLength(0);
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Show Tiny');
  });
});

describe('viewpoint inspector', () => {
  const twoViews = () =>
    tinyPlot({
      viewpoints: [
        {
          id: 'vp-1',
          name: 'House centre',
          kind: 'audience',
          position: { x: 0, y: -8, z: 1.6 },
          camera: null,
        },
        { id: 'vp-2', name: 'Camera 1', kind: 'audience', position: { x: 3, y: -6, z: 1.5 }, camera: null },
      ],
    });

  it('makes a viewpoint the main one', () => {
    const view = renderWithEditor(<Inspector />, twoViews());
    view.select(['vp-2']);
    fireEvent.click(screen.getByRole('button', { name: 'Make this the main viewpoint' }));
    expect(view.document().mainViewpointId).toBe('vp-2');
    expect(screen.getByText(/This is the main viewpoint/)).toBeTruthy();
  });

  it('turning it into a camera brings camera settings that can be edited', () => {
    const view = renderWithEditor(<Inspector />, twoViews());
    view.select(['vp-2']);
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'camera' } });
    expect(view.document().viewpoints[1].kind).toBe('camera');
    expect((screen.getByLabelText('Shutter angle') as HTMLInputElement).value).toBe('180');
    // 180° at 25 fps is open 180/360/25 = 1/50 s.
    fireEvent.change(screen.getByLabelText('Shutter given as'), { target: { value: 'time' } });
    expect((screen.getByLabelText('Shutter time') as HTMLInputElement).value).toBe('1/50');
    enter('Shutter time', '1/100');
    enter('ISO', '1600');
    enter('f-number', '0.2');
    expect(screen.getByRole('alert').textContent).toContain('from 0.5 to 128');
    expect(view.document().viewpoints[1].camera).toMatchObject({
      iso: 1600,
      shutter: { kind: 'time', seconds: 0.01 },
      fNumber: 2.8,
    });
    enter('Lens z', '2 m');
    expect(view.document().viewpoints[1].position.z).toBe(2);
  });

  it('is deleted from its panel, and the main role passes on', () => {
    const view = renderWithEditor(<Inspector />, twoViews());
    view.select(['vp-1']);
    fireEvent.click(screen.getByRole('button', { name: 'Delete this viewpoint' }));
    expect(view.document().viewpoints.map((item) => item.id)).toEqual(['vp-2']);
    expect(view.document().mainViewpointId).toBe('vp-2');
  });
});

describe('inspector layout', () => {
  it('keeps a half-typed value from carrying over to the next item', () => {
    const plot = tinyPlot();
    const view = renderWithEditor(<Inspector />, {
      ...plot,
      fixtures: [unit, { ...unit, id: 'fx-2', unit: 2 }],
    });
    view.select(['fx-1']);
    fireEvent.change(screen.getByLabelText('Mount y'), { target: { value: 'abc' } });
    view.select(['fx-2']);
    expect((screen.getByLabelText('Mount y') as HTMLInputElement).value).toBe('-2.00 m');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('gives every control an accessible name', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot());
    for (const ids of [[], ['fx-1'], ['pos-1'], ['sub-1'], ['vp-1']]) {
      view.select(ids);
      const controls = document.querySelectorAll('input, select, textarea, button');
      expect(controls.length).toBeGreaterThan(0);
      for (const control of controls) {
        const id = control.getAttribute('id');
        const labelled =
          (id !== null && document.querySelector(`label[for="${id}"]`)?.textContent) ||
          control.getAttribute('aria-label') ||
          (control.tagName === 'BUTTON' ? control.textContent : '');
        expect(labelled, `${control.outerHTML} has no name`).toBeTruthy();
      }
    }
  });
});
