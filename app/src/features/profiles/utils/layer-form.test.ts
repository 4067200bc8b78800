import { describe, expect, it } from 'vitest';
import { DEFAULT_LAYER_FORM, readLayerForm, type LayerForm } from './layer-form';

const withLayer = (name: keyof LayerForm, change: Partial<LayerForm['E']>): LayerForm => ({
  ...DEFAULT_LAYER_FORM,
  [name]: { ...DEFAULT_LAYER_FORM[name], ...change },
});

describe('readLayerForm', () => {
  it('turns the defaults into three layers with the thickness each shape takes', () => {
    const result = readLayerForm(DEFAULT_LAYER_FORM);
    expect(result.errors).toEqual({});
    expect(result.layers).toEqual([
      {
        name: 'E',
        shape: 'parabolic',
        criticalFrequencyMHz: 3,
        peakHeightKm: 110,
        semiThicknessKm: 20,
      },
      {
        name: 'F1',
        shape: 'parabolic',
        criticalFrequencyMHz: 3.8,
        peakHeightKm: 200,
        semiThicknessKm: 40,
      },
      {
        name: 'F2',
        shape: 'chapman',
        criticalFrequencyMHz: 8,
        peakHeightKm: 300,
        scaleHeightKm: 55,
      },
    ]);
    // The F1 parabola ends at 240 km, so at the F2 peak (300 km) only F2 contributes: the
    // highest plasma frequency of the sum is foF2 (SPEC §2.1: densities are summed).
    expect(result.profile?.maxPlasmaFrequencyMHz).toBeCloseTo(8, 9);
  });

  it('leaves out disabled layers and asks for at least one', () => {
    const onlyF2 = readLayerForm({
      ...DEFAULT_LAYER_FORM,
      E: { ...DEFAULT_LAYER_FORM.E, enabled: false },
      F1: { ...DEFAULT_LAYER_FORM.F1, enabled: false },
    });
    expect(onlyF2.layers?.map((l) => l.name)).toEqual(['F2']);
    const none = readLayerForm({
      E: { ...DEFAULT_LAYER_FORM.E, enabled: false },
      F1: { ...DEFAULT_LAYER_FORM.F1, enabled: false },
      F2: { ...DEFAULT_LAYER_FORM.F2, enabled: false },
    });
    expect(none.layers).toBeNull();
    expect(none.formError).toMatch(/at least one layer/);
  });

  it('names the layer and field of a missing number', () => {
    const result = readLayerForm(withLayer('F1', { criticalFrequencyMHz: '' }));
    expect(result.layers).toBeNull();
    expect(result.errors).toEqual({ F1: { criticalFrequencyMHz: 'Enter a number in MHz.' } });
  });

  it('reports the shared schema range check on the right field (critical frequency must be > 0)', () => {
    const result = readLayerForm(withLayer('E', { criticalFrequencyMHz: '-1' }));
    expect(result.errors.E?.criticalFrequencyMHz).toBeTruthy();
    expect(result.errors.F1).toBeUndefined();
  });

  it('reports the physics core check of a layer base below the ground on the thickness field', () => {
    // validateProfile: semiThicknessKm must not exceed peakHeightKm.
    const result = readLayerForm(withLayer('F1', { thicknessKm: '250' }));
    expect(result.layers).toBeNull();
    expect(result.errors.F1?.thicknessKm).toMatch(/peakHeightKm/);
  });
});
