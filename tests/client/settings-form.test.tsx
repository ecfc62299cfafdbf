import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEFAULT_SETTINGS, type Settings } from '@shared/schemas/settings';
import { ApiError } from '@/lib/api-client';
import { SettingsForm } from '@/features/settings/components/settings-form';

function renderForm(props: Partial<Parameters<typeof SettingsForm>[0]> = {}) {
  const onSave = vi.fn<(s: Settings) => void>();
  render(<SettingsForm initial={DEFAULT_SETTINGS} saving={false} saveError={null} saved={false} onSave={onSave} {...props} />);
  return onSave;
}

const field = (label: RegExp) => screen.getByLabelText(label) as HTMLInputElement;
/** The block a field sits in: its label, its control, its default and its message. */
const besideField = (label: RegExp) => field(label).closest('div') as HTMLElement;
const save = () => fireEvent.click(screen.getByRole('button', { name: 'Save settings' }));

describe('the settings form', () => {
  afterEach(cleanup);

  it('shows every compat threshold and load point with its unit and default', () => {
    renderForm();
    expect(field(/^Cranking voltage \(V\)/).value).toBe('10');
    expect(screen.getAllByText(/default 10 V/).length).toBeGreaterThan(0);
    expect(field(/^Charging voltage \(V\)/).value).toBe('14.5');
    expect(field(/^Idle: manifold pressure \(kPa\)/).value).toBe('35');
    expect(field(/^Full load: spark advance/).value).toBe('22');
    expect(field(/^Boost: pressure above full load/).value).toBe('0');
    expect(field(/^Flag price moves above \(%\)/).value).toBe('15');
  });

  it('refuses a value out of range, names it by its field and saves nothing', async () => {
    const onSave = renderForm();
    fireEvent.change(field(/^Charging voltage/), { target: { value: '-3' } });
    fireEvent.change(field(/^Idle: manifold pressure/), { target: { value: '' } });
    save();
    expect(await screen.findByText('Idle: manifold pressure is required')).toBeTruthy();
    expect(onSave).not.toHaveBeenCalled();
    expect(field(/^Charging voltage/).getAttribute('aria-invalid')).toBe('true');
    expect(within(besideField(/^Charging voltage/)).getByText('Charging voltage must be more than 0 V')).toBeTruthy();
    expect(screen.getByRole('status').textContent).toMatch(/2 fields need attention/);
  });

  it('holds the review threshold to the go threshold, as the shared schema does', async () => {
    const onSave = renderForm();
    fireEvent.change(field(/^Energy at cranking, review from/), { target: { value: '0.95' } });
    save();
    const row = besideField(/^Energy at cranking, review from/);
    expect(await within(row).findByText('“Energy at cranking, review from” must not exceed “Energy at cranking, go from”')).toBeTruthy();
    expect(onSave).not.toHaveBeenCalled();
  });

  it('keeps the store’s name and contact, and refuses a blank store name', async () => {
    const onSave = renderForm();
    expect(field(/^Store name/).value).toBe(DEFAULT_SETTINGS.store.name);
    fireEvent.change(field(/^Store name/), { target: { value: '  ' } });
    save();
    expect(await within(besideField(/^Store name/)).findByText('Store name must not be blank')).toBeTruthy();
    expect(onSave).not.toHaveBeenCalled();
    fireEvent.change(field(/^Store name/), { target: { value: 'Quillmere Parts & Ignition' } });
    fireEvent.change(field(/^Address/), { target: { value: '12 Tanner Row\nQuillmere' } });
    save();
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    expect(onSave.mock.calls[0]![0].store).toEqual({
      name: 'Quillmere Parts & Ignition',
      phone: DEFAULT_SETTINGS.store.phone,
      address: '12 Tanner Row\nQuillmere',
    });
  });

  it('saves valid values as numbers', async () => {
    const onSave = renderForm();
    fireEvent.change(field(/^Charging voltage/), { target: { value: '14,2' } });
    fireEvent.change(field(/^Cruise: intake temperature/), { target: { value: '325' } });
    save();
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const saved = onSave.mock.calls[0]![0];
    expect(saved.compat.chargingVoltageV).toBe(14.2);
    expect(saved.compat.loadPoints.cruise.tempK).toBe(325);
    expect(saved.priceList).toEqual(DEFAULT_SETTINGS.priceList);
  });

  it('shows the API’s field messages by their fields', () => {
    const err = new ApiError(400, 'validation_failed', 'settings.compat.flybackPeakV: Too big', [
      { field: 'settings.compat.flybackPeakV', message: 'Too big: expected number to be <=2000' },
    ]);
    renderForm({ saveError: err });
    expect(within(besideField(/^Primary flyback peak/)).getByText('Too big: expected number to be <=2000')).toBeTruthy();
  });
});
