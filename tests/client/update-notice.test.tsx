import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { UpdateNotice } from '@/app/pwa/update-notice';

/** A page with a note form the member can type into, send, or leave. */
function PageWithForm({ needRefresh, onUpdate }: { needRefresh: boolean; onUpdate: () => void }) {
  const [open, setOpen] = useState(true);
  return (
    <>
      {open && (
        <form aria-label="Return note" onSubmit={(e) => e.preventDefault()}>
          <label>
            Note <input name="note" />
          </label>
          <button type="submit">Send</button>
        </form>
      )}
      <button type="button" onClick={() => setOpen(false)}>
        Leave the form
      </button>
      <UpdateNotice needRefresh={needRefresh} onUpdate={onUpdate} />
    </>
  );
}

describe('UpdateNotice', () => {
  it('says nothing while no new version waits', () => {
    render(<PageWithForm needRefresh={false} onUpdate={vi.fn()} />);
    expect(screen.queryByText(/Update ready/)).toBeNull();
  });

  it('offers the new version and reloads only on the tap', async () => {
    const onUpdate = vi.fn();
    render(<PageWithForm needRefresh onUpdate={onUpdate} />);
    expect(screen.getByRole('status').textContent).toContain('Update ready');
    expect(onUpdate).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Reload now' }));
    expect(onUpdate).toHaveBeenCalledOnce();
    // The reload may wait for the page's fetches to settle: the tap is answered at once, and not offered twice.
    expect(screen.getByRole('status').textContent).toBe('Updating…');
    expect(screen.queryByRole('button', { name: 'Reload now' })).toBeNull();
  });

  it('holds the reload while a form is half filled in, and offers it once the form is sent', async () => {
    const onUpdate = vi.fn();
    render(<PageWithForm needRefresh onUpdate={onUpdate} />);
    await userEvent.type(screen.getByLabelText('Note'), 'nosepiece worn');
    expect(await screen.findByText('Update ready — finish or leave this form first.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Reload now' })).toBeNull();

    await userEvent.click(screen.getByRole('button', { name: 'Send' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Reload now' }));
    expect(onUpdate).toHaveBeenCalledOnce();
  });

  it('offers the reload again once the member leaves the half-filled form', async () => {
    render(<PageWithForm needRefresh onUpdate={vi.fn()} />);
    await userEvent.type(screen.getByLabelText('Note'), 'short two temporary fasteners');
    expect(screen.queryByRole('button', { name: 'Reload now' })).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Leave the form' }));
    expect(await screen.findByRole('button', { name: 'Reload now' })).toBeTruthy();
  });
});
