import { TestBed } from '@angular/core/testing';
import { of, throwError } from 'rxjs';
import { InstantSave } from '../../core/forms/instant-save';
import { SaveStatus } from './save-status';

describe('SaveStatus', () => {
  function render(setting: InstantSave<number>) {
    const fixture = TestBed.createComponent(SaveStatus);
    fixture.componentRef.setInput('setting', setting);
    fixture.componentRef.setInput('testId', 'thing-saved');
    fixture.detectChanges();
    return { fixture, el: fixture.nativeElement as HTMLElement };
  }

  it('says nothing until a save lands, then announces it on the line the test id names', () => {
    const setting = new InstantSave<number>();
    const { fixture, el } = render(setting);
    expect(el.textContent?.trim()).toBe('');
    expect(el.querySelector('[aria-live="polite"]')).not.toBeNull();

    setting.save(() => of(3));
    fixture.detectChanges();
    const saved = el.querySelector('[data-testid="thing-saved"]');
    expect(saved?.getAttribute('role')).toBe('status');
    expect(saved?.textContent).toContain('Saved for the club.');
    expect(el.querySelector('[role="alert"]')).toBeNull();
  });

  it('shows a refusal in the words the setting gives it, as an alert, and no "saved" line', () => {
    const setting = new InstantSave<number>(() => 'Choose between 1 and 10 seasons.');
    const { fixture, el } = render(setting);
    setting.save(() => throwError(() => new Error('400')));
    fixture.detectChanges();
    expect(el.querySelector('[role="alert"]')?.textContent).toContain('Choose between 1 and 10 seasons.');
    expect(el.querySelector('[data-testid="thing-saved"]')).toBeNull();
  });
});
