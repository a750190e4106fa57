import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { ReturnPhotoPicker } from '@/features/photos/components/return-photo-picker';
import { ToolPhotos } from '@/features/photos/components/tool-photos';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders } from '../helpers/render';

beforeEach(() => setCsrfToken('token-1'));

const jpeg = (bytes = 1000) => new File([new Uint8Array(bytes)], 'IMG_0042.jpg', { type: 'image/jpeg' });
const thumbnails = () => screen.queryAllByRole('button', { name: /^Open photo/ }).map((b) => b.querySelector('img')?.getAttribute('src'));
const photo = (id: number) => ({ id, width: 1600, height: 1200, url: `/api/photos/${id}`, thumbnailUrl: `/api/photos/${id}/thumbnail` });

describe('ToolPhotos', () => {
  it('shows thumbnails and opens the full photo, then closes it', async () => {
    renderWithProviders(<ToolPhotos code="T-0007" photoIds={[3, 5]} canUpload={false} />);
    expect(thumbnails()).toEqual(['/api/photos/3/thumbnail', '/api/photos/5/thumbnail']);
    expect(screen.queryByLabelText('Add photo')).toBeNull();

    await userEvent.click(screen.getByRole('button', { name: 'Open photo 2 of 2 of T-0007' }));
    const viewer = screen.getByRole('dialog', { name: 'Photo 2 of 2 of T-0007' });
    expect(within(viewer).getByRole('img').getAttribute('src')).toBe('/api/photos/5');
    expect(within(viewer).queryByRole('button', { name: 'Remove photo' })).toBeNull();
    await userEvent.click(within(viewer).getByRole('button', { name: 'Close' }));
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('says so when there are no photos yet', () => {
    renderWithProviders(<ToolPhotos code="T-0007" photoIds={[]} canUpload />);
    expect(screen.getByText('No photos of T-0007 yet.')).toBeTruthy();
  });

  it('uploads a photo from the camera input with the CSRF token and shows it at once', async () => {
    // The server answers only when the test says so, to see the busy state in between.
    let answer: (v: Response) => void = () => {};
    const fetchFn = vi.fn((_path: string, _init: RequestInit) => new Promise<Response>((resolve) => (answer = resolve)));
    vi.stubGlobal('fetch', fetchFn);
    const onChange = vi.fn();
    renderWithProviders(<ToolPhotos code="T-0007" photoIds={[3]} canUpload onChange={onChange} />);

    const input = screen.getByLabelText('Add photo');
    expect(input.getAttribute('accept')).toBe('image/*');
    expect(input.getAttribute('capture')).toBe('environment');
    await userEvent.upload(input, jpeg());

    expect(await screen.findByText('Uploading photo…')).toBeTruthy();
    const [path, init] = fetchFn.mock.calls[0]!;
    expect(path).toBe('/api/tools/T-0007/photos');
    expect(init).toMatchObject({ method: 'POST', headers: { 'X-CSRF-Token': 'token-1' } });
    // The browser writes the multipart Content-Type with its boundary; a JSON one would break the upload.
    expect((init.headers as Record<string, string>)['Content-Type']).toBeUndefined();
    expect(((init.body as FormData).get('photo') as File).name).toBe('IMG_0042.jpg');

    answer(new Response(JSON.stringify(photo(9)), { status: 201, headers: { 'Content-Type': 'application/json' } }));
    expect(await screen.findByText('Photo added.')).toBeTruthy();
    expect(thumbnails()).toEqual(['/api/photos/3/thumbnail', '/api/photos/9/thumbnail']);
    expect(onChange).toHaveBeenCalledOnce();
    expect(screen.getByLabelText('Add photo')).toBeTruthy();
  });

  it('shows the server’s sentence when the file is not a picture', async () => {
    fakeFetch(() => ({ status: 415, body: { error: { code: 'NOT_AN_IMAGE', message: 'That file is not a picture Gripline can read.' } } }));
    renderWithProviders(<ToolPhotos code="T-0007" photoIds={[]} canUpload />);
    await userEvent.upload(screen.getByLabelText('Add photo'), jpeg());
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toMatch(/Problem.*not a picture Gripline can read/);
    expect(thumbnails()).toEqual([]);
  });

  it('refuses a file over 10 MB without sending it', async () => {
    const calls = fakeFetch(() => ({ status: 201, body: photo(1) }));
    renderWithProviders(<ToolPhotos code="T-0007" photoIds={[]} canUpload />);
    await userEvent.upload(screen.getByLabelText('Add photo'), jpeg(10 * 1024 * 1024 + 1));
    expect((await screen.findByRole('alert')).textContent).toMatch(/larger than 10 MB/);
    expect(calls).toHaveLength(0);
  });

  it('lets the quartermaster remove a photo after confirming', async () => {
    const calls = fakeFetch(({ method }) => (method === 'DELETE' ? { status: 204 } : undefined));
    renderWithProviders(<ToolPhotos code="T-0007" photoIds={[3, 5]} canUpload canDelete />);
    await userEvent.click(screen.getByRole('button', { name: 'Open photo 1 of 2 of T-0007' }));
    await userEvent.click(screen.getByRole('button', { name: 'Remove photo' }));
    expect(calls).toHaveLength(0);
    await userEvent.click(screen.getByRole('button', { name: 'Confirm remove' }));
    expect(await screen.findByText('Photo removed.')).toBeTruthy();
    expect(calls.map((c) => `${c.method} ${c.path}`)).toEqual(['DELETE /api/photos/3']);
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(thumbnails()).toEqual(['/api/photos/5/thumbnail']);
  });
});

describe('ReturnPhotoPicker', () => {
  it('hands the uploaded photo’s id to the return, and undefined when it is left out', async () => {
    fakeFetch(() => ({ status: 201, body: photo(12) }));
    const onUploaded = vi.fn();
    renderWithProviders(<ReturnPhotoPicker code="T-0007" onUploaded={onUploaded} />);
    await userEvent.upload(screen.getByLabelText('Add photo'), jpeg());
    await waitFor(() => expect(onUploaded).toHaveBeenLastCalledWith(12));
    expect(screen.getByRole('img', { name: 'Your photo of T-0007' }).getAttribute('src')).toBe('/api/photos/12/thumbnail');
    await userEvent.click(screen.getByRole('button', { name: 'Leave the photo out' }));
    expect(onUploaded).toHaveBeenLastCalledWith(undefined);
    expect(screen.queryByRole('img')).toBeNull();
  });
});
