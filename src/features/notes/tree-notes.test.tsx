import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import type { Note } from '@shared/schemas/note';
import { TreeRoute } from '@/app/routes/tree';
import { treeAdvice } from '@/test/advice-fixtures';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush, tree } from '@/test/fixtures';
import { note, photo } from '@/test/note-fixtures';
import { renderPage } from '@/test/render';

const NOTES = 'GET /api/trees/7/notes';
const ADVICE = 'GET /api/trees/7/advice';

const hazard = {
  noteId: 33,
  body: 'Dead limb over the drop line: keep clear on windy days.',
  createdAt: '2026-10-14T14:10:00.000Z',
};

function openTree(role: Role, routes: Record<string, unknown> = {}) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role),
    'GET /api/trees/7': tree(),
    'GET /api/sugarbushes/3': sugarbush({ role }),
    'GET /api/trees/7/measurements': page([]),
    'GET /api/trees/7/tapholes': page([]),
    'GET /api/trees/7/photos': page([]),
    [ADVICE]: treeAdvice({ hazards: [hazard] }),
    [NOTES]: page([
      note({ id: 33, category: 'hazard', body: hazard.body }),
      note({
        id: 34,
        body: 'Sapsucker holes at breast height.',
        resolvedAt: '2026-11-02T10:00:00.000Z',
        resolvedById: 11,
        resolvedByName: 'Pat owner',
        photos: [photo({ id: 21, noteId: 34 })],
      }),
    ]),
    ...routes,
  });
  const view = renderPage({ path: '/trees/:treeId', url: '/trees/7', element: <TreeRoute /> });
  return { api, ...view };
}

describe('notes and photos on the tree page', () => {
  it('shows an open hazard at the top of the page, before any drilling advice, to the tapper', async () => {
    openTree('tapper');
    const notice = await screen.findByRole('complementary', { name: 'Hazard at this tree' });
    expect(notice).toHaveTextContent(hazard.body);
    const advice = await screen.findByRole('heading', { name: /Advice for/ });
    const form = await screen.findByRole('heading', { name: 'Record taphole' });
    for (const later of [advice, form])
      expect(notice.compareDocumentPosition(later) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    // The tapper reads notes but does not write or resolve them.
    expect(await screen.findByText('Sapsucker holes at breast height.')).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Write a note on this tree' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Resolve' })).toBeNull();
  });

  it('when the consultant resolves an open note and reopens a resolved one, then each is sent and the notes and advice are asked for again', async () => {
    const changes: unknown[] = [];
    const patch =
      (id: number): Handler =>
      (req) => {
        changes.push({ id, ...(req.body as object) });
        const resolved = (req.body as { resolved: boolean }).resolved;
        return {
          status: 200,
          body: note({ id, resolvedAt: resolved ? '2026-12-01T00:00:00Z' : null }) satisfies Note,
        };
      };
    const { api, user } = openTree('consultant', {
      'PATCH /api/notes/33': patch(33),
      'PATCH /api/notes/34': patch(34),
    });
    const list = await screen.findByRole('list', { name: 'Notes on tree 0412' });
    expect(within(list).getByText(/Resolved by Pat owner on Nov 2, 2026/)).toBeInTheDocument();
    const notesBefore = api.to(NOTES).length;
    const adviceBefore = api.to(ADVICE).length;

    await user.click(within(list).getByRole('button', { name: 'Resolve' }));
    await user.click(within(list).getByRole('button', { name: 'Reopen' }));
    await waitFor(() => expect(changes).toHaveLength(2));
    expect(changes).toEqual([
      { id: 33, resolved: true },
      { id: 34, resolved: false },
    ]);
    await waitFor(() => expect(api.to(NOTES).length).toBeGreaterThan(notesBefore));
    await waitFor(() => expect(api.to(ADVICE).length).toBeGreaterThan(adviceBefore));
  });

  it('when a photo’s thumbnail is chosen, then the full image opens, and Escape closes it', async () => {
    const { user } = openTree('tapper');
    const thumbs = await screen.findByRole('list', { name: 'Photos of the note on tree 0412' });
    const thumb = within(thumbs).getByRole('img');
    expect(thumb).toHaveAttribute('src', '/api/photos/21?size=thumb');
    await user.click(within(thumbs).getByRole('button'));
    const viewer = screen.getByRole('dialog');
    expect(within(viewer).getByRole('img')).toHaveAttribute('src', '/api/photos/21');
    expect(within(viewer).getByRole('button', { name: 'Close' })).toHaveFocus();
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('when the consultant writes a hazard note on the tree, then it is sent with no follow-up date', async () => {
    const { api, user } = openTree('consultant', {
      'POST /api/trees/7/notes': json(201, note({ id: 50, category: 'hazard' })),
    });
    const form = await screen.findByRole('region', { name: 'Write a note on this tree' });
    await user.selectOptions(within(form).getByLabelText('Category'), 'Hazard');
    await user.type(within(form).getByLabelText('Note'), 'Wasp nest at the base.');
    await user.click(within(form).getByRole('button', { name: 'Save note' }));
    expect(await within(form).findByText('Note saved.')).toBeInTheDocument();
    expect(api.to('POST /api/trees/7/notes')[0].body).toEqual({
      category: 'hazard',
      body: 'Wasp nest at the base.',
      followUpOn: null,
    });
  });

  it('when the owner adds a photo of the tree, then it is uploaded and the photos are read again; a refused one says why', async () => {
    let uploads = 0;
    const { api, user } = openTree('owner', {
      'POST /api/trees/7/photos': (() =>
        ++uploads === 1
          ? { status: 201, body: photo() }
          : {
              status: 413,
              body: {
                error: {
                  code: 'file-too-large',
                  message: 'The photo is larger than the 10 MB allowed',
                },
              },
            }) satisfies Handler,
    });
    const section = await screen.findByRole('region', { name: 'Photos' });
    expect(await within(section).findByText('No photos of this tree yet.')).toBeInTheDocument();
    const input = within(section).getByLabelText('Add a photo of the tree');
    await user.upload(input, new File([new Uint8Array([1])], 'trunk.jpg', { type: 'image/jpeg' }));
    await user.click(within(section).getByRole('button', { name: 'Upload photo' }));
    expect(await within(section).findByText('Photo saved.')).toBeInTheDocument();
    expect(api.to('GET /api/trees/7/photos').length).toBeGreaterThan(1);

    await user.upload(
      within(section).getByLabelText('Add a photo of the tree'),
      new File([new Uint8Array([1])], 'big.jpg', { type: 'image/jpeg' }),
    );
    await user.click(within(section).getByRole('button', { name: 'Upload photo' }));
    expect(await within(section).findByRole('alert')).toHaveTextContent(
      'The photo is larger than the 10 MB allowed',
    );
  });
});
