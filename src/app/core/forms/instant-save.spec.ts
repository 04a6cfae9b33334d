import { HttpErrorResponse } from '@angular/common/http';
import { Subject, of, throwError } from 'rxjs';
import { InstantSave } from './instant-save';

describe('InstantSave', () => {
  it('holds the value read, then the value saved, and says "saved" only after the server took it', () => {
    const setting = new InstantSave<{ seasons: number }>();
    setting.load(of({ seasons: 3 }));
    expect(setting.value()).toEqual({ seasons: 3 });

    const answer = new Subject<{ seasons: number }>();
    const done: number[] = [];
    setting.save(
      () => answer,
      (value) => done.push(value.seasons),
    );
    expect(setting.saving()).toBe(true);
    expect(setting.saved()).toBe(false);

    answer.next({ seasons: 5 });
    answer.complete();
    expect(setting.value()).toEqual({ seasons: 5 });
    expect(setting.saving()).toBe(false);
    expect(setting.saved()).toBe(true);
    expect(done).toEqual([5]);
  });

  it('sends nothing while a save is under way', () => {
    const setting = new InstantSave<number>();
    const answer = new Subject<number>();
    let requests = 0;
    setting.save(() => {
      requests++;
      return answer;
    });
    setting.save(() => {
      requests++;
      return of(2);
    });
    expect(requests).toBe(1);
    answer.next(1);
    expect(setting.value()).toBe(1);
  });

  it('words a refusal with the given wording, keeps the value held and clears "saved"', () => {
    const setting = new InstantSave<number>((error) =>
      error instanceof HttpErrorResponse ? `refused ${error.status}` : 'other',
    );
    setting.save(() => of(4));
    expect(setting.saved()).toBe(true);
    setting.save(() => throwError(() => new HttpErrorResponse({ status: 409 })));
    expect(setting.value()).toBe(4);
    expect(setting.saved()).toBe(false);
    expect(setting.saving()).toBe(false);
    expect(setting.error()).toBe('refused 409');
  });

  it('shows the server problem when reading fails, by default', () => {
    const setting = new InstantSave<number>();
    setting.load(
      throwError(
        () =>
          new HttpErrorResponse({ status: 403, error: { title: 'Only the head of coaching may see this.' } }),
      ),
    );
    expect(setting.value()).toBeNull();
    expect(setting.error()).toBe('Only the head of coaching may see this.');
  });
});
