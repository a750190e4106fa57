import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { FormFooter } from '@/components/ui/form-footer';

function renderForm(busy: boolean, onCancel?: () => void) {
  const onSubmit = vi.fn((e: { preventDefault: () => void }) => e.preventDefault());
  render(
    <form aria-label="Order" onSubmit={onSubmit}>
      <FormFooter submit="Save order" busy={busy} onCancel={onCancel} />
    </form>,
  );
  return onSubmit;
}

describe('FormFooter', () => {
  it('sends the form, and Cancel closes it without sending', async () => {
    const onCancel = vi.fn();
    const onSubmit = renderForm(false, onCancel);
    await userEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(onCancel).toHaveBeenCalledOnce();
    expect(onSubmit).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Save order' }));
    expect(onSubmit).toHaveBeenCalledOnce();
  });

  it('takes no second press while saving, and has no Cancel when the form cannot be closed', async () => {
    const onSubmit = renderForm(true);
    const save = screen.getByRole('button', { name: 'Save order' });
    expect(save.getAttribute('aria-busy')).toBe('true');
    await userEvent.click(save);
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.queryByRole('button', { name: 'Cancel' })).toBeNull();
  });
});
