import { carryOverTyping, typedBeforeStart } from './first-paint';

/** A page drawn in advance, as server/build/prerender.ts writes it. */
function drawnPage(): HTMLElement {
  const root = document.createElement('cw-root');
  root.setAttribute('data-prerendered', '');
  root.innerHTML =
    '<form><input name="email" type="email"><input name="password" type="password"><button type="submit" disabled>Sign in</button></form>';
  document.body.append(root);
  return root;
}

/** The same page as the app draws it, with what typing in it does. */
function appPage(root: HTMLElement): string[] {
  const heard: string[] = [];
  root.innerHTML = '<form><input name="email" type="email"><input name="password" type="password"></form>';
  root.addEventListener('input', (event) => {
    const input = event.target as HTMLInputElement;
    heard.push(`${input.name}=${input.value}`);
  });
  return heard;
}

describe('typing before the app starts', () => {
  afterEach(() => document.querySelector('cw-root')?.remove());

  it('finds nothing to carry when the page was not drawn in advance', () => {
    document.body.append(document.createElement('cw-root'));
    expect(typedBeforeStart(document)).toBeNull();
  });

  it('keeps what was typed and where the cursor was, then hands it to the app’s own fields', () => {
    const root = drawnPage();
    root.querySelector<HTMLInputElement>('[name=email]')!.value = 'sam@club.example';
    root.querySelector<HTMLInputElement>('[name=password]')!.value = 'half-typ';
    root.querySelector<HTMLInputElement>('[name=password]')!.focus();

    const typed = typedBeforeStart(document)!;
    expect([...typed.values]).toEqual([
      ['email', 'sam@club.example'],
      ['password', 'half-typ'],
    ]);
    expect(typed.focused).toBe('password');
    // Read once: the mark is gone, so a later start finds nothing to carry.
    expect(root.hasAttribute('data-prerendered')).toBe(false);

    const heard = appPage(root);
    carryOverTyping(document, typed);
    expect(root.querySelector<HTMLInputElement>('[name=email]')!.value).toBe('sam@club.example');
    expect(heard).toEqual(['email=sam@club.example', 'password=half-typ']);
    expect((document.activeElement as HTMLInputElement).name).toBe('password');
  });

  it('leaves alone a field the app has filled itself', () => {
    const root = drawnPage();
    root.querySelector<HTMLInputElement>('[name=email]')!.value = 'typed@club.example';
    const typed = typedBeforeStart(document)!;
    const heard = appPage(root);
    root.querySelector<HTMLInputElement>('[name=email]')!.value = 'kept@club.example';
    carryOverTyping(document, typed);
    expect(root.querySelector<HTMLInputElement>('[name=email]')!.value).toBe('kept@club.example');
    expect(heard).toEqual([]);
  });
});
