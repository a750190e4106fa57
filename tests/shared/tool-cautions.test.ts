import { describe, expect, it } from 'vitest';
import { TOOL_CATEGORIES } from '@shared/tools/categories';
import { toolCautions, type ToolCautionKey } from '@shared/safety/tool-cautions';

const keys = (...categories: Parameters<typeof toolCautions>[0][]) => toolCautions(categories.flatMap((c) => [...c])).map((c) => c.key);

describe('tool cautions by category', () => {
  it('gives a rivet gun the compressed-air, trigger, eye and hearing cautions', () => {
    expect(keys(['rivet_gun'])).toEqual<ToolCautionKey[]>(['compressed_air', 'rivet_gun', 'eye_protection', 'hearing_protection']);
  });

  it('gives a bucking bar the trigger caution (the bar behind the rivet) and no compressed-air one', () => {
    expect(keys(['bucking_bar'])).toEqual<ToolCautionKey[]>(['rivet_gun', 'eye_protection', 'hearing_protection']);
  });

  it('gives drill bits the drilling and eye cautions, and an air drill the air and hearing ones too', () => {
    expect(keys(['drill_bit'])).toEqual<ToolCautionKey[]>(['drilling', 'eye_protection']);
    expect(keys(['air_drill'])).toEqual<ToolCautionKey[]>(['drilling', 'compressed_air', 'eye_protection', 'hearing_protection']);
    expect(keys(['pneumatic_rivet_puller'])).toEqual<ToolCautionKey[]>(['compressed_air', 'eye_protection', 'hearing_protection']);
  });

  it('gives a countersink cutter the drilling and eye cautions, and dimple dies the eye and fingers-clear cautions', () => {
    expect(keys(['countersink_cutter'])).toEqual<ToolCautionKey[]>(['drilling', 'eye_protection']);
    expect(keys(['dimple_dies'])).toEqual<ToolCautionKey[]>(['dimple_dies', 'eye_protection']);
    const text = Object.fromEntries(toolCautions(['dimple_dies']).map((c) => [c.key, c.text]));
    expect(text.dimple_dies).toMatch(/fingers clear of the dies/i);
  });

  it('gives hand tools that cannot hurt this way none', () => {
    for (const category of ['hand_rivet_puller', 'temporary_fastener_tray', 'deburring_tool', 'spacing_fan', 'torque_wrench', 'measuring', 'other'] as const) {
      expect(keys([category])).toEqual([]);
    }
  });

  it('names each caution once for many tools, in one fixed order whatever order the tools come in', () => {
    const all = keys([...TOOL_CATEGORIES]);
    expect(all).toEqual<ToolCautionKey[]>(['drilling', 'compressed_air', 'rivet_gun', 'dimple_dies', 'eye_protection', 'hearing_protection']);
    expect(keys(['drill_bit', 'rivet_gun', 'drill_bit'])).toEqual(keys(['rivet_gun', 'drill_bit']));
  });

  it('words each caution for the bench: deburr both sides, never air at skin, disconnect first, set and bar before the trigger', () => {
    const text = Object.fromEntries(toolCautions(TOOL_CATEGORIES).map((c) => [c.key, c.text]));
    expect(text.drilling).toMatch(/clamp/i);
    expect(text.drilling).toMatch(/chips/i);
    expect(text.drilling).toMatch(/deburr both sides of every hole/i);
    expect(text.compressed_air).toMatch(/never point .* at skin/i);
    expect(text.compressed_air).toMatch(/disconnect the air before/i);
    expect(text.rivet_gun).toMatch(/set is on the rivet and the bucking bar is held behind it/);
  });
});
