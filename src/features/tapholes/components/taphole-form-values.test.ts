import {
  bitSizes,
  emptyTapholeForm,
  heightText,
  inSystem,
  toTapholeInput,
  withSpot,
  type TapholeDefaults,
} from './taphole-form-values';
import { nearestPoint } from '@/lib/compass';

const defaults: TapholeDefaults = {
  season: 2027,
  depthCm: 5.08,
  bitCm: 0.79375,
  collection: 'vacuum',
};
const form = (system: 'imperial' | 'metric' = 'metric') => emptyTapholeForm(system, '2026-03-02');

describe('turning the taphole form into a payload', () => {
  it('offers the three bits the trade sells, in cm to the fraction’s last digit', () => {
    expect(bitSizes).toEqual([0.79375, 0.7540625, 1.11125]); // 5/16, 19/64, 7/16 in × 2.54
  });

  it('reads feet and inches, or inches alone, at exactly 2.54 cm an inch', () => {
    const both = toTapholeInput(
      { ...form('imperial'), feet: '3', inches: '7', side: 'S' },
      defaults,
    );
    const inchesOnly = toTapholeInput({ ...form('imperial'), inches: '43', side: 'S' }, defaults);
    expect(both).toMatchObject({ ok: true, input: { heightCm: 109.22 } });
    expect(inchesOnly).toMatchObject({ ok: true, input: { heightCm: 109.22 } });
  });

  it('when the depth is left as advised, then the advised figure is sent as it is', () => {
    const result = toTapholeInput({ ...form('imperial'), inches: '40', side: 'N' }, defaults);
    expect(result).toMatchObject({ ok: true, input: { depthCm: 5.08, bitCm: 0.79375 } });
  });

  it('when exact degrees are typed, then they win over the compass point', () => {
    const result = toTapholeInput({ ...form(), cm: '100', side: 'S', exactDeg: '200' }, defaults);
    expect(result).toMatchObject({ ok: true, input: { azimuthDeg: 200 } });
  });

  it('when the season is not a year, then the form says how to write one', () => {
    const result = toTapholeInput({ ...form(), cm: '100', side: 'S', season: '27' }, defaults);
    expect(result).toEqual({
      ok: false,
      errors: { season: 'Enter the season as a year, like 2027' },
    });
  });

  it('when the depth is past the schema’s limit, then the limit is named in the tapper’s units', () => {
    const result = toTapholeInput(
      { ...form('imperial'), inches: '40', side: 'S', depth: '5' },
      defaults,
    );
    expect(result).toEqual({
      ok: false,
      errors: { depthCm: 'Depth must be between 0.4 in and 3.1 in, bark included' },
    });
  });
});

describe('moving between units and advised spots', () => {
  it('shows a height as whole feet and inches, or centimetres', () => {
    expect(heightText(110, 'imperial')).toEqual({ feet: '3', inches: '7', cm: '' });
    expect(heightText(20, 'imperial')).toEqual({ feet: '', inches: '8', cm: '' });
    expect(heightText(110, 'metric')).toEqual({ feet: '', inches: '', cm: '110' });
  });

  it('when the unit toggle flips, then what was typed is kept in the new unit', () => {
    const metric = inSystem({ ...form('imperial'), feet: '3', inches: '7', depth: '2' }, 'metric');
    expect(metric).toMatchObject({ system: 'metric', cm: '109.2', depth: '5.1' });
  });

  it('fills the exact degrees only for a spot between the eight points', () => {
    expect(withSpot(form(), { azimuthDeg: 180, heightCm: 110 })).toMatchObject({
      side: 'S',
      exactDeg: '',
      cm: '110',
    });
    expect(withSpot(form(), { azimuthDeg: 200, heightCm: 95 })).toMatchObject({
      side: 'S',
      exactDeg: '200',
    });
    expect(nearestPoint(350)).toBe('N');
  });
});
