import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { CsvPreview } from '../../../../../shared/types';
import { CsvImport } from './csv-import';

const PREVIEW: CsvPreview = {
  importId: 'signed-lines',
  rows: [
    { row: 2, displayName: 'Kai M. 🦊', goalkeeper: true },
    {
      row: 3,
      displayName: 'Kai M.',
      goalkeeper: false,
      clash: true,
      note: 'Line 2 has the same name. Type a name the team can tell apart, or leave the line out.',
    },
    { row: 4, displayName: 'Sam O.', goalkeeper: false },
  ],
  errors: [{ row: 5, field: 'name', message: 'Line 5 has no name.' }],
};

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 5; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

describe('CsvImport', () => {
  async function setUp() {
    TestBed.configureTestingModule({
      imports: [CsvImport],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
    });
    const fixture = TestBed.createComponent(CsvImport);
    fixture.componentRef.setInput('teamId', 't1');
    fixture.detectChanges();
    const root = fixture.nativeElement as HTMLElement;
    const http = TestBed.inject(HttpTestingController);
    const input = root.querySelector('input[type=file]') as HTMLInputElement;
    // jsdom cannot set a file input's files the way a browser does: the list is given directly.
    const choose = async (text: string) => {
      const file = new File([text], 'squad.csv', { type: 'text/csv' });
      Object.defineProperty(input, 'files', { value: [file], configurable: true });
      input.dispatchEvent(new Event('change'));
      await settle(fixture);
    };
    return { fixture, root, http, choose };
  }

  afterEach(() => TestBed.inject(HttpTestingController).verify());

  const names = (root: HTMLElement) =>
    Array.from(root.querySelectorAll<HTMLInputElement>('.cw-line-name input')).map((i) => i.value);
  const addButton = (root: HTMLElement) =>
    Array.from(root.querySelectorAll('button')).find((b) => b.textContent?.trim().startsWith('Add'))!;

  it('says the limit and that names are shortened before anything is chosen', async () => {
    const { root } = await setUp();
    expect(root.textContent).toContain('Up to 60 players per file.');
    expect(root.textContent).toContain('each name is shortened to the first name and the first letter');
  });

  it('shows the lines to add and the lines not read, and blocks a clash until the coach types a name', async () => {
    const { fixture, root, http, choose } = await setUp();
    await choose('Name\n');
    http.expectOne('/api/teams/t1/players/import').flush(PREVIEW);
    await settle(fixture);
    expect(names(root)).toEqual(['Kai M. 🦊', 'Kai M.', 'Sam O.']);
    expect(root.textContent).toContain('Line 5 has no name.');
    expect(root.textContent).toContain('Line 2 has the same name.');
    expect(addButton(root).disabled).toBe(true);

    const line3 = root.querySelectorAll<HTMLInputElement>('.cw-line-name input')[1]!;
    line3.value = 'Kai Mas.';
    line3.dispatchEvent(new Event('input'));
    await settle(fixture);
    expect(addButton(root).disabled).toBe(false);
    addButton(root).click();
    const commit = http.expectOne('/api/teams/t1/players/import/commit');
    expect(commit.request.body).toEqual({
      importId: 'signed-lines',
      rows: [
        { row: 2, displayName: 'Kai M. 🦊', goalkeeper: true },
        { row: 3, displayName: 'Kai Mas.', goalkeeper: false },
        { row: 4, displayName: 'Sam O.', goalkeeper: false },
      ],
    });
    commit.flush([]);
    await settle(fixture);
    expect(root.textContent).toContain('0 players added.');

    // The same file chosen again is sent again.
    await choose('Name\n');
    http.expectOne('/api/teams/t1/players/import').flush(PREVIEW);
    await settle(fixture);
    expect(names(root)).toEqual(['Kai M. 🦊', 'Kai M.', 'Sam O.']);
  });
});
