import type { Device, Project, ProjectMember, ReviewRequest, Sheet, SheetSummary } from '@channelwright/shared/schemas';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { draftReviewState, HASH_OF_R1, project as revisionProject, reviewRequest, revision } from '../features/revisions/testing/revision-fixtures';
import { installFakeApi } from '../test/fake-api';
import { workbenchHandlers } from '../test/fake-compute-api';
import { storedDevice, storedSheet, wrenmoss } from '../test/fake-sheets';
import { demoConfig, designer, reviewer } from '../test/fixtures';
import { renderApp } from '../test/render-app';

// Every page here keeps what it read for 30 s (lib/query-client.ts). These tests change something on
// one page and go back to another that read it before: it must show the change at once, because the
// change invalidated its query, not because the cache aged. Invented demo data throughout.

const µ = 1e-6;
const summaryOf = ({ devices: _devices, totals: _totals, ...summary }: Sheet): SheetSummary => summary;

const viewer: ProjectMember = { userId: 'u-viewer', email: 'quill@brackenfold.example', displayName: 'Quill Ashdown', role: 'viewer', addedAt: '2025-03-05T09:00:00.000Z' };

/** The Wrenmoss project in memory: one sheet with one device (stale when asked), two members (three with a viewer). */
function fakeWorkspace({ staleDevice = false, withViewer = false } = {}) {
  let devices: Device[] = [storedDevice('d-m1', 0, { name: 'M1', function: 'input pair (+)', polarity: 'pmos', id: 10 * µ, l: 0.5 * µ, vds: 0.6, gmId: 16 }, staleDevice)];
  const extraSheets: Sheet[] = [];
  const members: ProjectMember[] = [
    { userId: designer.id, email: designer.email, displayName: designer.displayName, role: 'owner', addedAt: '2025-03-04T09:00:00.000Z' },
    { userId: reviewer.id, email: reviewer.email, displayName: reviewer.displayName, role: 'reviewer', addedAt: '2025-03-04T09:00:00.000Z' },
    ...(withViewer ? [{ ...viewer }] : []),
  ];
  const amplifier = () => storedSheet(devices);
  const sheets = () => [amplifier(), ...extraSheets];
  const theProject = (): Project => ({ ...wrenmoss, myRole: 'owner', sheetCount: sheets().length, memberCount: members.length });

  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    ...workbenchHandlers,
    // The device page's charts stay computing: these tests are about counts, not curves.
    'POST /api/compute/sweep': () => new Promise<never>(() => {}),
    'GET /api/projects': () => ({ body: [theProject()] }),
    [`GET /api/projects/${wrenmoss.id}`]: () => ({ body: theProject() }),
    [`GET /api/projects/${wrenmoss.id}/sheets`]: () => ({ body: sheets().map(summaryOf) }),
    [`GET /api/projects/${wrenmoss.id}/members`]: () => ({ body: members }),
    [`POST /api/projects/${wrenmoss.id}/members`]: ({ body }) => {
      const member: ProjectMember = { userId: 'u-new', email: (body as { email: string }).email, displayName: 'Orla Penhallow', role: 'designer', addedAt: '2025-03-06T09:00:00.000Z' };
      members.push(member);
      return { status: 201, body: member };
    },
    [`PATCH /api/projects/${wrenmoss.id}/members/${viewer.userId}`]: ({ body }) => {
      const member = members.find((m) => m.userId === viewer.userId) as ProjectMember;
      member.role = (body as { role: ProjectMember['role'] }).role;
      return { body: member };
    },
    [`POST /api/projects/${wrenmoss.id}/sheets`]: ({ body }) => {
      const sheet = { ...storedSheet([]), id: 's-new', name: (body as { name: string }).name };
      extraSheets.push(sheet);
      return { status: 201, body: sheet };
    },
    'GET /api/sheets/s-amp': () => ({ body: amplifier() }),
    'GET /api/sheets/s-new': () => ({ body: extraSheets[0] }),
    'GET /api/sheets/s-amp/review-state': { body: draftReviewState({ sheetId: 's-amp', projectId: wrenmoss.id }) },
    'GET /api/sheets/s-new/review-state': { body: draftReviewState({ sheetId: 's-new', projectId: wrenmoss.id }) },
    'POST /api/sheets/s-amp/devices': ({ body }) => {
      const device = storedDevice(`d-${devices.length + 1}`, devices.length, body as never);
      devices = [...devices, device];
      return { status: 201, body: device };
    },
    'PATCH /api/sheets/s-amp/devices/d-m1': ({ body }) => {
      const { version: _version, ...changes } = body as { version: number };
      const [m1] = devices;
      const saved = { ...storedDevice(m1.id, 0, { ...m1.targets, ...changes }), version: m1.version + 1 };
      devices = [saved, ...devices.slice(1)];
      return { body: saved };
    },
  });
}

/** The cell under a column title in the row that links to `rowLink`. */
function cellOf(table: HTMLElement, rowLink: string, column: string): HTMLElement {
  const titles = within(table).getAllByRole('columnheader').map((th) => th.textContent?.trim());
  const row = within(table).getByRole('link', { name: rowLink }).closest('tr') as HTMLElement;
  return within(row).getAllByRole('cell')[titles.indexOf(column)];
}

const SHEET = 'Two-stage amplifier';
const sheetsTable = () => screen.findByRole('table', { name: 'Sheets' }, { timeout: 10_000 });
const projectsTable = () => screen.findByRole('table', { name: 'Projects' }, { timeout: 10_000 });
const breadcrumb = (name: string) => within(screen.getByRole('navigation', { name: 'Breadcrumbs' })).getByRole('link', { name });
/** A page of the navbar (the navigation landmark that is not the breadcrumbs). */
const navbarLink = (name: string) =>
  within(screen.getAllByRole('navigation').find((nav) => nav.getAttribute('aria-label') !== 'Breadcrumbs') as HTMLElement).getByRole('link', { name });

describe('pages that read something before it changed', { timeout: 30_000 }, () => {
  it("show a device duplicated on the sheet page in the project page's device count at once", async () => {
    const api = fakeWorkspace();
    const { user } = renderApp(`/projects/${wrenmoss.id}`, { token: 'token-ines' });
    expect(cellOf(await sheetsTable(), SHEET, 'Devices')).toHaveTextContent('1');

    await user.click(within(await sheetsTable()).getByRole('link', { name: SHEET }));
    await screen.findByRole('table', { name: 'Devices' }, { timeout: 10_000 });
    await user.click(await screen.findByRole('button', { name: 'Actions for M1' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Duplicate M1' }));
    await waitFor(() => expect(api.to('POST /api/sheets/s-amp/devices')).toHaveLength(1));
    await user.click(breadcrumb(wrenmoss.name));

    await waitFor(async () => expect(cellOf(await sheetsTable(), SHEET, 'Devices')).toHaveTextContent('2'));
  });

  it("show a stale device saved again on its page as a current sheet on the project page at once", async () => {
    const api = fakeWorkspace({ staleDevice: true });
    const { user } = renderApp(`/projects/${wrenmoss.id}`, { token: 'token-ines' });
    expect(cellOf(await sheetsTable(), SHEET, 'Results')).toHaveTextContent('1 stale');

    await user.click(within(await sheetsTable()).getByRole('link', { name: SHEET }));
    await user.click(within(await screen.findByRole('table', { name: 'Devices' }, { timeout: 10_000 })).getByRole('link', { name: 'M1' }));
    const length = await screen.findByRole('textbox', { name: 'L' }, { timeout: 10_000 });
    await user.clear(length);
    await user.click(length);
    await user.paste('1u');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(api.to('PATCH /api/sheets/s-amp/devices/d-m1')).toHaveLength(1));
    await screen.findByText('Saved as version 2');
    await user.click(breadcrumb(wrenmoss.name));

    await waitFor(async () => expect(cellOf(await sheetsTable(), SHEET, 'Results')).toHaveTextContent('current'));
  });

  it("show a sheet created on the project page in the home page's sheet count at once", async () => {
    const api = fakeWorkspace();
    const { user, router } = renderApp('/', { token: 'token-ines' });
    expect(cellOf(await projectsTable(), wrenmoss.name, 'Sheets')).toHaveTextContent('1');

    await user.click(within(await projectsTable()).getByRole('link', { name: wrenmoss.name }));
    await user.click(await screen.findByRole('button', { name: 'New sheet' }, { timeout: 10_000 }));
    const dialog = await screen.findByRole('form', { name: 'New sheet' });
    await user.type(within(dialog).getByRole('textbox', { name: /^Name/ }), 'Sleep switch');
    await user.click(within(dialog).getByRole('combobox', { name: /^Process profile/ }));
    await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
    await user.click(within(dialog).getByRole('button', { name: 'Create sheet' }));
    await waitFor(() => expect(api.to(`POST /api/projects/${wrenmoss.id}/sheets`)).toHaveLength(1));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sheets/s-new'));
    await screen.findByText('No devices yet', {}, { timeout: 10_000 });
    await user.click(breadcrumb('Projects'));

    await waitFor(async () => expect(cellOf(await projectsTable(), wrenmoss.name, 'Sheets')).toHaveTextContent('2'));
  });

  it("show a member added on the project page in the home page's member count at once", async () => {
    const api = fakeWorkspace();
    const { user } = renderApp('/', { token: 'token-ines' });
    expect(cellOf(await projectsTable(), wrenmoss.name, 'Members')).toHaveTextContent('2');

    await user.click(within(await projectsTable()).getByRole('link', { name: wrenmoss.name }));
    const form = await screen.findByRole('form', { name: 'Add a member' }, { timeout: 10_000 });
    await user.type(within(form).getByRole('textbox', { name: 'Add by e-mail' }), 'orla@brackenfold.example');
    await user.click(within(form).getByRole('button', { name: 'Add member' }));
    await waitFor(() => expect(api.to(`POST /api/projects/${wrenmoss.id}/members`)).toHaveLength(1));
    await user.click(navbarLink('Home'));

    await waitFor(async () => expect(cellOf(await projectsTable(), wrenmoss.name, 'Members')).toHaveTextContent('3'));
  });

  it('offer a member just given the reviewer role in the review dialog at once', async () => {
    const api = fakeWorkspace({ withViewer: true });
    const { user } = renderApp('/sheets/s-amp', { token: 'token-ines' });
    const openReviewerChoices = async () => {
      await user.click(await screen.findByRole('button', { name: 'Freeze revision' }, { timeout: 10_000 }));
      const dialog = await screen.findByRole('dialog');
      await user.click(within(dialog).getByRole('combobox', { name: /Reviewer/ }));
      await screen.findAllByRole('option');
      return dialog;
    };
    const choices = () => screen.getAllByRole('option').map((option) => option.textContent);
    const dialog = await openReviewerChoices();
    expect(choices()).toEqual([`${reviewer.displayName} (reviewer)`]);
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));

    await user.click(breadcrumb(wrenmoss.name));
    await user.click(await screen.findByRole('combobox', { name: `Role of ${viewer.displayName}` }, { timeout: 10_000 }));
    await user.click(await screen.findByRole('option', { name: 'Reviewer' }));
    await waitFor(() => expect(api.to(`PATCH /api/projects/${wrenmoss.id}/members/${viewer.userId}`)).toHaveLength(1));
    await user.click(within(await sheetsTable()).getByRole('link', { name: SHEET }));

    await openReviewerChoices();
    await waitFor(() => expect(choices()).toContain(`${viewer.displayName} (reviewer)`));
  });

  it('take a request the reviewer decided on the revision page out of their inbox at once', async () => {
    let request: ReviewRequest = reviewRequest();
    let current = revision();
    const api = installFakeApi({
      'GET /api/config': { body: demoConfig },
      'GET /api/auth/me': { body: reviewer },
      'GET /api/review-requests': () => ({ body: request.state === 'open' ? [request] : [] }),
      'GET /api/projects/p-wren': { body: revisionProject('reviewer') },
      'GET /api/revisions/rev-1': () => ({ body: current }),
      'GET /api/revisions/rev-1/review-requests': () => ({ body: [request] }),
      'GET /api/revisions/rev-1/diff': { body: { revisionId: 'rev-1', againstId: null, againstLabel: null, added: [], removed: [], sheetChanges: [], changed: [] } },
      'GET /api/revisions/rev-1/comments': { body: [] },
      'POST /api/review-requests/req-1/decision': ({ body }) => {
        request = { ...request, state: 'approved', decidedAt: '2026-03-01T12:00:00.000Z', decisionComment: (body as { comment: string }).comment, signedHash: HASH_OF_R1 };
        current = { ...current, state: 'signed-off', signOff: { reviewRequestId: 'req-1', by: { id: reviewer.id, displayName: reviewer.displayName }, at: '2026-03-01T12:00:00.000Z', hash: HASH_OF_R1 } };
        return { body: request };
      },
    });
    const { user } = renderApp('/reviews', { token: 'token-hollis' });
    const inbox = await screen.findByRole('table', { name: 'Assigned to me' }, { timeout: 10_000 });

    await user.click(within(inbox).getByRole('link', { name: 'Two-stage amplifier r1' }));
    await user.type(await screen.findByRole('textbox', { name: /Decision comment/ }, { timeout: 10_000 }), 'Signed off for layout');
    await user.click(screen.getByRole('button', { name: 'Approve and sign off' }));
    await waitFor(() => expect(api.to('POST /api/review-requests/req-1/decision')).toHaveLength(1));
    await screen.findByText(`Signed off by ${reviewer.displayName}`);
    await user.click(navbarLink('Reviews'));

    expect(await screen.findByText('Nothing waiting')).toBeInTheDocument();
  });
});
