import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import { upcomingSeason } from '@shared/schemas/plan';
import { NotesRoute } from '@/app/routes/notes';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush } from '@/test/fixtures';
import { attentionItem, attentionPage, note, photo } from '@/test/note-fixtures';
import { renderPage } from '@/test/render';

const QUEUE = 'GET /api/sugarbushes/3/attention';
const NOTES = 'GET /api/sugarbushes/3/notes';
const WRITE = 'POST /api/sugarbushes/3/notes';

const queueItems = [
  attentionItem({
    treeId: 7,
    tag: '0412',
    openHazards: 1,
    nextFollowUpOn: '2026-01-05',
    reasons: ['hazard', 'overdue', 'warning'],
    warnings: ['crown-dieback'],
  }),
  attentionItem({
    treeId: 8,
    tag: '0413',
    verdict: 'rest',
    reasons: ['warning'],
    warnings: ['zone-depleted'],
  }),
];

function openNotes(
  role: Role = 'consultant',
  routes: Record<string, unknown> = {},
  url = '/sugarbushes/3/notes',
) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role),
    'GET /api/sugarbushes/3': sugarbush({ role }),
    [QUEUE]: attentionPage(queueItems),
    [NOTES]: page([
      note({ id: 31, category: 'hazard', body: 'Hanger over the mainline.' }),
      note({
        id: 32,
        treeId: null,
        treeTag: null,
        category: 'management',
        body: 'Thin the beech.',
      }),
    ]),
    ...routes,
  });
  const view = renderPage({ path: '/sugarbushes/:id/notes', url, element: <NotesRoute /> });
  return { api, ...view };
}

const lastQuery = (api: ReturnType<typeof mockApi>, key: string) =>
  api.to(key).at(-1)!.url.searchParams;

describe('the needs-a-look queue', () => {
  it('shows each tree with why it needs a look, most pressing as the API orders them, for the upcoming season', async () => {
    const { api } = openNotes();
    const list = await screen.findByRole('list', { name: 'Trees that need a look' });
    const [first, second] = [...list.children] as HTMLElement[];
    expect(within(first).getByRole('link', { name: '0412' })).toHaveAttribute('href', '/trees/7');
    const why = within(first).getByRole('list', { name: 'Why tree 0412 needs a look' });
    expect(within(why).getByText('Hazard')).toBeInTheDocument();
    expect(within(why).getByText(/Follow-up overdue since Jan 5, 2026/)).toBeInTheDocument();
    expect(within(why).getByText('Crown dieback')).toBeInTheDocument();
    expect(within(second).getByText('Little clear wood left')).toBeInTheDocument();
    expect(lastQuery(api, QUEUE).get('pageSize')).toBe('25');
    expect(lastQuery(api, QUEUE).get('season')).toBe(String(upcomingSeason()));
    expect(lastQuery(api, QUEUE).get('sort')).toBe('priority');
  });

  it('when a reason and an order are chosen, then the queue is asked for them and the URL keeps them', async () => {
    const { api, user, router } = openNotes();
    await screen.findByRole('list', { name: 'Trees that need a look' });
    const queue = within(screen.getByRole('region', { name: 'Needs a look' }));
    await user.selectOptions(queue.getByLabelText('Why'), 'Open hazard');
    await waitFor(() => expect(lastQuery(api, QUEUE).get('reason')).toBe('hazard'));
    await user.selectOptions(queue.getByLabelText('Order'), 'Tag, A to Z');
    await waitFor(() => expect(lastQuery(api, QUEUE).get('sort')).toBe('tag'));
    const search = new URLSearchParams(router.state.location.search);
    expect(search.get('reason')).toBe('hazard');
    expect(search.get('sort')).toBe('tag');
  });

  it('when nothing needs a look, then it says so; when the queue fails, then a retry asks again', async () => {
    openNotes('owner', { [QUEUE]: attentionPage([]) });
    expect(await screen.findByText('Nothing needs a look')).toBeInTheDocument();

    let calls = 0;
    const failing: Handler = () =>
      ++calls === 1
        ? { status: 500, body: { error: { code: 'internal', message: 'Disk full' } } }
        : { status: 200, body: attentionPage(queueItems) };
    const { user } = openNotes('owner', { [QUEUE]: failing });
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent("We couldn't load the trees that need a look.");
    await user.click(within(alert).getByRole('button', { name: 'Retry' }));
    expect(await screen.findAllByRole('list', { name: 'Trees that need a look' })).not.toHaveLength(
      0,
    );
  });
});

describe('the stand’s notes', () => {
  it('lists notes on trees and on the whole stand, and a category filter asks the API for it', async () => {
    const { api, user } = openNotes();
    const list = await screen.findByRole('list', { name: 'Notes' });
    expect(within(list).getByRole('link', { name: 'Tree 0412' })).toHaveAttribute(
      'href',
      '/trees/7',
    );
    expect(within(list).getByText('Whole stand')).toBeInTheDocument();
    expect(within(list).getByText('Hanger over the mainline.')).toBeInTheDocument();
    const notes = within(screen.getByRole('region', { name: 'Notes on the stand and its trees' }));
    await user.selectOptions(notes.getByLabelText('Category'), 'Hazard');
    await waitFor(() => expect(lastQuery(api, NOTES).get('category')).toBe('hazard'));
  });

  it('when the consultant writes a note on the stand with a follow-up date and a photo, then both are sent and it says so', async () => {
    const { api, user } = openNotes('consultant', {
      [WRITE]: ((req) => ({
        status: 201,
        body: note({ id: 40, treeId: null, ...(req.body as object) }),
      })) satisfies Handler,
      'POST /api/notes/40/photos': json(201, photo({ noteId: 40 })),
    });
    const form = await screen.findByRole('region', { name: 'Write a note on the stand' });
    expect(within(form).getByLabelText('Category')).toHaveValue('management');
    await user.type(within(form).getByLabelText('Note'), 'Walk the mainline after every storm.');
    await user.type(within(form).getByLabelText('Follow up by'), '2027-03-01');
    const file = new File([new Uint8Array([0xff, 0xd8, 0xff])], 'line.jpg', { type: 'image/jpeg' });
    await user.upload(within(form).getByLabelText('Photo'), file);
    await user.click(within(form).getByRole('button', { name: 'Save note' }));

    expect(await within(form).findByText('Note and photo saved.')).toBeInTheDocument();
    expect(api.to(WRITE)[0].body).toEqual({
      category: 'management',
      body: 'Walk the mainline after every storm.',
      followUpOn: '2027-03-01',
    });
    const sent = api.to('POST /api/notes/40/photos')[0].body as FormData;
    expect((sent.get('file') as File).name).toBe('line.jpg');
    // The list is asked for again, with the new note in it.
    await waitFor(() => expect(api.to(NOTES).length).toBeGreaterThan(1));
  });

  it('when the note is empty, then it is not sent; when the API refuses a field, then its message shows under it', async () => {
    const { api, user } = openNotes('owner', {
      [WRITE]: json(400, {
        error: {
          code: 'invalid-input',
          message: 'Some fields need attention',
          fields: { followUpOn: 'Not a real date' },
        },
      }),
    });
    const form = await screen.findByRole('region', { name: 'Write a note on the stand' });
    await user.click(within(form).getByRole('button', { name: 'Save note' }));
    expect(await within(form).findByText('Write the note')).toBeInTheDocument();
    expect(api.to(WRITE)).toHaveLength(0);

    await user.type(within(form).getByLabelText('Note'), 'Check the spring line.');
    await user.click(within(form).getByRole('button', { name: 'Save note' }));
    expect(await within(form).findByText('Not a real date')).toBeInTheDocument();
    expect(within(form).getByLabelText('Follow up by')).toHaveAccessibleDescription(
      expect.stringContaining('Not a real date'),
    );
    expect(within(form).queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when the photo is refused, then the note stays saved and the reason shows', async () => {
    const { user } = openNotes('consultant', {
      [WRITE]: json(201, note({ id: 41, treeId: null })),
      'POST /api/notes/41/photos': json(415, {
        error: {
          code: 'unsupported-photo-type',
          message: 'Send a photo as a JPEG, PNG or WebP image',
        },
      }),
    });
    const form = await screen.findByRole('region', { name: 'Write a note on the stand' });
    await user.type(within(form).getByLabelText('Note'), 'Culvert washed out.');
    await user.upload(
      within(form).getByLabelText('Photo'),
      new File(['text'], 'x.png', { type: 'image/png' }),
    );
    await user.click(within(form).getByRole('button', { name: 'Save note' }));
    expect(await within(form).findByRole('alert')).toHaveTextContent(
      'The note is saved, but not its photo: Send a photo as a JPEG, PNG or WebP image',
    );
  });

  it('when a tapper opens the page, then there is no form and no resolving, and it says who writes notes', async () => {
    openNotes('tapper', { [NOTES]: page([]) });
    expect(
      await screen.findByText(
        'The owner and the consultant write notes here and on each tree’s page.',
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Write a note on the stand' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Resolve' })).toBeNull();
  });
});
