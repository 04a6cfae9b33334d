import { HttpErrorResponse } from '@angular/common/http';
import { FormControl, FormGroup } from '@angular/forms';
import { showProblem } from './form-errors';

function refusal(errors: { field: string; message: string }[], title = 'Check the fields.') {
  return new HttpErrorResponse({ status: 400, error: { title, errors } });
}

describe('showProblem', () => {
  const form = () => new FormGroup({ password: new FormControl(''), name: new FormControl('') });

  it("reads a fragment after the field's label and pins it under its control", () => {
    const group = form();
    const above = showProblem(group, refusal([{ field: 'password', message: 'is not your password' }]), {
      password: 'Your password',
    });
    expect(above).toBeNull();
    expect(group.controls.password.errors?.['message']).toBe('Your password is not your password.');
    expect(group.controls.password.touched).toBe(true);
  });

  it('keeps a whole sentence as the server wrote it', () => {
    const group = form();
    showProblem(group, refusal([{ field: 'name', message: 'Names are at most 80 characters.' }]), {
      name: 'Your name',
    });
    expect(group.controls.name.errors?.['message']).toBe('Names are at most 80 characters.');
  });

  it('returns the whole problem when a field has no control, or no field is named', () => {
    const group = form();
    expect(showProblem(group, refusal([{ field: 'clubId', message: 'is unknown' }], 'Not saved'), {})).toBe(
      'Not saved (clubId: is unknown)',
    );
    expect(
      showProblem(group, new HttpErrorResponse({ status: 409, error: { title: 'Hand over first.' } }), {}),
    ).toBe('Hand over first.');
  });
});
