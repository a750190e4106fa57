import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { BinForm } from '@/features/stock/components/bin-form';
import { ApiError } from '@/lib/api-client';
import { binFixture } from '../helpers/bin-fixture';
import { renderWithProviders } from '../helpers/render';

const preview = () => screen.getByTestId('designation-preview').textContent;
const optionTexts = (label: string) => within(screen.getByLabelText(label)).getAllByRole('option').map((o) => o.textContent);

function renderForm(bin?: Parameters<typeof BinForm>[0]['bin']) {
  const onSubmit = vi.fn((_body: unknown) => Promise.resolve());
  renderWithProviders(<BinForm bin={bin} submitLabel="Add the bin" onSubmit={onSubmit} />);
  return onSubmit;
}

describe('BinForm', () => {
  it('for a blind rivet shows each grip dash with its range and previews our readable designation', async () => {
    renderForm();
    expect(screen.getByLabelText('Kind')).toHaveProperty('value', 'blind_structural');
    // Grip ranges by dash: TM 10-5410-221-14/1 Table 4-3 (IFI 114 convention), as in the reference file.
    expect(optionTexts('Grip dash')).toEqual([
      'Choose the grip',
      '−1 (0.020–0.062 in)',
      '−2 (0.063–0.125 in)',
      '−3 (0.126–0.187 in)',
      '−4 (0.188–0.250 in)',
      '−5 (0.251–0.312 in)',
      '−6 (0.313–0.375 in)',
      '−8 (0.376–0.500 in)',
    ]);
    expect(screen.queryByLabelText('Length')).toBeNull();
    expect(optionTexts('Head')).toEqual(['Choose the head', 'Dome', '100° countersunk', 'Large flange']);
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'dome');
    await userEvent.selectOptions(screen.getByLabelText('Body material'), '5056');
    await userEvent.selectOptions(screen.getByLabelText('Stem'), 'steel');
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '1/8 in (−4)');
    await userEvent.selectOptions(screen.getByLabelText('Grip dash'), '2');
    expect(preview()).toBe('Blind, structural, dome, 5056, steel stem · 1/8 in · grip −2 (0.063–0.125 in)');
    expect(screen.getByText('Caution: which rivet goes where')).toBeTruthy();
    expect(screen.getByText(/General-purpose \(soft\) blind rivets are not for structure/)).toBeTruthy();
  });

  it('offers the usual final drill of the chosen blind rivet as the hole drill example, not one fixed drill', async () => {
    renderForm();
    const holeDrill = () => screen.getByLabelText("Hole drill, if the maker's differs").getAttribute('placeholder');
    // Blind rivet holes (TM 10-5410-221-14/1 Table 4-3): 3/32 in #40 (common practice inside 0.096–0.100 in), 5/32 in #20.
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '3/32 in (−3)');
    expect(holeDrill()).toBe('#40');
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '5/32 in (−5)');
    expect(holeDrill()).toBe('#20');
  });

  it('for a solid rivet asks for length in 16ths shown in inches and previews the MS number', async () => {
    const onSubmit = renderForm();
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'solid_rivet');
    expect(screen.queryByLabelText('Grip dash')).toBeNull();
    expect(screen.queryByLabelText('Stem')).toBeNull();
    expect(optionTexts('Length')).toContain('−6 (3/8 in)');
    expect(optionTexts('Length')).toContain('−3.5 (7/32 in)');
    // An MS20470 head is the universal head; dome is the blind rivet's word (trade-checks.md §4). The solid
    // rivet heads are universal (MS20470) and 100° countersunk (MS20426) only: AC 43.13-1B para 4-57a;
    // NAVEDTRA 14315 Table 3-1. A large flange is a blind-rivet head.
    expect(optionTexts('Head')).toEqual(['Choose the head', 'Universal head', '100° countersunk']);
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'dome');
    await userEvent.selectOptions(screen.getByLabelText('Body material'), '2117-T4');
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '4');
    await userEvent.selectOptions(screen.getByLabelText('Length'), '6');
    // MS20470AD4-6: universal head, 2117-T4, 1/8 in diameter, 3/8 in long (AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1).
    expect(preview()).toBe('MS20470AD4-6');
    // MS20426 is the 100° countersunk head (same sources).
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'countersunk');
    expect(preview()).toBe('MS20426AD4-6');
    // Monel is not among the standards' aluminium-alloy material codes (A, AD, D, DD, B): a plain description, no MS number.
    await userEvent.selectOptions(screen.getByLabelText('Body material'), 'monel');
    expect(preview()).toBe('Solid, 100° countersunk, monel · 1/8 in · 3/8 in long');
    await userEvent.selectOptions(screen.getByLabelText('Body material'), '2117-T4');

    await userEvent.clear(screen.getByLabelText('Unit cost ($)'));
    await userEvent.type(screen.getByLabelText('Unit cost ($)'), '0.0825');
    await userEvent.clear(screen.getByLabelText('Opening stock'));
    await userEvent.type(screen.getByLabelText('Opening stock'), '1000');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({
      kind: 'solid_rivet',
      head: 'countersunk',
      material: '2117-T4',
      diameter32: 4,
      length16: 6,
      grip16: null,
      stemMaterial: null,
      unitCost: 0.0825,
      packSize: 100,
      initialQuantity: 1000,
    });
  });

  it('keeps a large flange head on the list when a blind bin becomes solid, so the field shows it, and refuses it in words', async () => {
    const onSubmit = renderForm();
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'flange');
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'solid_rivet');
    expect(screen.getByLabelText<HTMLSelectElement>('Head').selectedOptions[0]!.textContent).toBe('Large flange');
    await userEvent.selectOptions(screen.getByLabelText('Body material'), '2117-T4');
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '1/8 in (−4)');
    await userEvent.selectOptions(screen.getByLabelText('Length'), '6');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    expect(await screen.findByText('A solid rivet’s head is universal or 100° countersunk; large flange is a blind-rivet head.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'dome');
    expect(optionTexts('Head')).toEqual(['Choose the head', 'Universal head', '100° countersunk']);
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ kind: 'solid_rivet', head: 'dome' });
  });

  it('refuses a rivet bin without its spec, naming each missing part', async () => {
    const onSubmit = renderForm();
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    expect(await screen.findByText('A rivet bin needs its head: dome, countersunk or flange.')).toBeTruthy();
    expect(screen.getByText('A rivet bin needs its body material, like 5056 or 2117-T4.')).toBeTruthy();
    expect(screen.getByText('A rivet bin needs its diameter in 32nds of an inch, like 4 for 1/8 in.')).toBeTruthy();
    expect(screen.getByText('A blind rivet bin needs its grip dash, like 2 for 0.063–0.125 in.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('drops a spec chosen before the kind changed to a screw, and then asks for a name', async () => {
    const onSubmit = renderForm();
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'dome');
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '4');
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'screw');
    expect(screen.queryByLabelText('Head')).toBeNull();
    expect(screen.queryByText('Caution: which rivet goes where')).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    expect(await screen.findByText('Give the bin a name, like "Screw #8-32 × 1/2 pan head".')).toBeTruthy();
    await userEvent.type(screen.getByLabelText('Name'), 'Screw #8-32 × 1/2 pan head');
    expect(preview()).toBe('Screw #8-32 × 1/2 pan head');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ kind: 'screw', head: null, diameter32: null, name: 'Screw #8-32 × 1/2 pan head' });
  });

  it('asks for a drill size on a drill bit bin, and checks cost and pack size', async () => {
    const onSubmit = renderForm();
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'drill_bit');
    await userEvent.type(screen.getByLabelText('Name'), 'Drill bit, jobber');
    await userEvent.clear(screen.getByLabelText('Pack size'));
    await userEvent.clear(screen.getByLabelText('Unit cost ($)'));
    await userEvent.type(screen.getByLabelText('Unit cost ($)'), '0.12345');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    expect(await screen.findByText('A drill bit bin needs its size, like #40.')).toBeTruthy();
    expect(screen.getByText('Enter the pack size.')).toBeTruthy();
    expect(screen.getByText('Give the unit cost to at most 4 decimals (a hundredth of a cent).')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('edits a bin with its current values and no opening stock', async () => {
    const onSubmit = renderForm(
      binFixture('B-0107', { kind: 'blind_structural', head: 'countersunk', material: '5056', stemMaterial: 'stainless', diameter32: 5, grip16: 3, unitCost: 0.21, packSize: 250 }),
    );
    expect(screen.queryByLabelText('Opening stock')).toBeNull();
    expect(screen.queryByLabelText('Label code')).toBeNull();
    expect(screen.getByLabelText('Head')).toHaveProperty('value', 'countersunk');
    expect(screen.getByLabelText('Grip dash')).toHaveProperty('value', '3');
    expect(screen.getByLabelText('Pack size')).toHaveProperty('value', '250');
    expect(screen.getByLabelText('Unit cost ($)')).toHaveProperty('value', '0.21');
    expect(preview()).toBe('Blind, structural, 100° countersunk, 5056, stainless stem · 5/32 in · grip −3 (0.126–0.187 in)');
    await userEvent.clear(screen.getByLabelText('Reorder point'));
    await userEvent.type(screen.getByLabelText('Reorder point'), '300');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ head: 'countersunk', diameter32: 5, grip16: 3, stemMaterial: 'stainless', packSize: 250, reorderPoint: 300, length16: null });
  });

  it('asks for the grip range from the box, with the table’s band for the dash as placeholder, and sends it', async () => {
    const onSubmit = renderForm();
    await userEvent.selectOptions(screen.getByLabelText('Head'), 'dome');
    await userEvent.selectOptions(screen.getByLabelText('Body material'), '5056');
    await userEvent.selectOptions(screen.getByLabelText('Diameter'), '4');
    await userEvent.selectOptions(screen.getByLabelText('Grip dash'), '3');
    const range = screen.getByRole('group', { name: 'Grip range (from the box)' });
    // −3: 0.126–0.187 in (TM 10-5410-221-14/1 Table 4-3).
    expect(within(range).getByLabelText('Smallest grip (in)')).toHaveProperty('placeholder', '0.126');
    expect(within(range).getByLabelText('Largest grip (in)')).toHaveProperty('placeholder', '0.187');
    await userEvent.type(screen.getByLabelText('Smallest grip (in)'), '0.1875');
    await userEvent.type(screen.getByLabelText('Largest grip (in)'), '0.14');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    expect(await screen.findByText('The smallest grip (0.188 in) must be below the largest (0.140 in).')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();

    await userEvent.clear(screen.getByLabelText('Smallest grip (in)'));
    await userEvent.type(screen.getByLabelText('Smallest grip (in)'), '0.110');
    expect(preview()).toBe('Blind, structural, dome, 5056 · 1/8 in · grip −3 (0.110–0.140 in)');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ grip16: 3, gripMin: 0.11, gripMax: 0.14 });
  });

  it('leaves the range empty on an edit when it is the table’s band, and shows a range from the box', async () => {
    const onSubmit = renderForm(binFixture('B-0107', { kind: 'blind_structural', head: 'dome', material: '5056', diameter32: 4, grip16: 2, gripMin: 0.07 }));
    // Only the smallest grip is the box's; the largest is the −2 band's 0.125 in.
    expect(screen.getByLabelText('Smallest grip (in)')).toHaveProperty('value', '0.07');
    expect(screen.getByLabelText('Largest grip (in)')).toHaveProperty('value', '');
    expect(screen.getByLabelText('Largest grip (in)')).toHaveProperty('placeholder', '0.125');
    // A new dash with an empty range takes the new dash's band.
    await userEvent.clear(screen.getByLabelText('Smallest grip (in)'));
    await userEvent.selectOptions(screen.getByLabelText('Grip dash'), '4');
    expect(preview()).toBe('Blind, structural, dome, 5056 · 1/8 in · grip −4 (0.188–0.250 in)');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ grip16: 4, gripMin: 0.188, gripMax: 0.25 });
  });

  it('puts a server refusal on its field', async () => {
    const onSubmit = vi.fn(() =>
      Promise.reject(new ApiError(409, 'BIN_CODE_TAKEN', 'The code B-0107 is already on another bin.', [{ path: 'code', message: 'B-0107 is taken.' }])),
    );
    renderWithProviders(<BinForm submitLabel="Add the bin" onSubmit={onSubmit} />);
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'other');
    await userEvent.type(screen.getByLabelText('Name'), 'Masking tape 1 in');
    await userEvent.type(screen.getByLabelText('Label code'), 'b-0107');
    await userEvent.click(screen.getByRole('button', { name: 'Add the bin' }));
    expect(await screen.findByText('B-0107 is taken.')).toBeTruthy();
    expect(screen.getByText('The code B-0107 is already on another bin.')).toBeTruthy();
    expect(onSubmit.mock.calls[0]).toBeDefined();
  });
});
