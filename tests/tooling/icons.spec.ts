/**
 * The app's icons are inline SVGs from one hand-kept list (src/app/core/icons/icon-names.ts). `ng build`
 * already refuses an unlisted name in a template; this spec holds the rest of the bargain: no icon
 * left as font ligature text, every component with icons imports the type check, the generated path
 * data matches the list (regenerate: npm run -s generate:icons), and no listed icon goes unused.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ICON_SVGS_PATH, iconSource } from '../../server/cli/icon-sources';
import { ICON_PATHS } from '../../src/app/core/icons/generated/icon-svgs';
import { ICON_NAMES } from '../../src/app/core/icons/icon-names';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const APP = join(ROOT, 'src/app');
const ICONS_DIR = join(APP, 'core/icons');

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    return entry.isDirectory() ? filesUnder(path) : [path];
  });
}

const appFiles = filesUnder(APP).filter((path) => !path.startsWith(ICONS_DIR) && !path.endsWith('.spec.ts'));

interface Template {
  /** Where it is written: an .html file, or the component's .ts for an inline template. */
  file: string;
  /** Where the template text starts in that file. */
  offset: number;
  text: string;
}

interface ComponentSource {
  file: string;
  source: string;
  template: Template;
}

const components: ComponentSource[] = appFiles
  .filter((file) => file.endsWith('.ts'))
  .map((file) => ({ file, source: readFileSync(file, 'utf8') }))
  .filter(({ source }) => source.includes('@Component('))
  .map(({ file, source }) => {
    const url = /templateUrl:\s*'([^']+)'/.exec(source)?.[1];
    if (url !== undefined) {
      const html = join(dirname(file), url);
      return { file, source, template: { file: html, offset: 0, text: readFileSync(html, 'utf8') } };
    }
    const inline = /template:\s*`([^`]*)`/.exec(source);
    if (!inline) throw new Error(`${relative(ROOT, file)}: no template found`);
    const offset = inline.index + inline[0].indexOf('`') + 1;
    return { file, source, template: { file, offset, text: inline[1] } };
  });

/** Every template in the app: each component's, and any .html file no component names. */
const templates: Template[] = [
  ...components.map((component) => component.template),
  ...appFiles
    .filter((file) => file.endsWith('.html'))
    .filter((file) => !components.some((component) => component.template.file === file))
    .map((file) => ({ file, offset: 0, text: readFileSync(file, 'utf8') })),
];

interface IconTag {
  where: string;
  attributes: string;
  /** The text between <mat-icon ...> and </mat-icon>; '' when self-closing. */
  content: string;
}

function iconTags(template: Template): IconTag[] {
  const source = readFileSync(template.file, 'utf8');
  const tag = /<mat-icon\b((?:[^>"']|"[^"]*"|'[^']*')*?)(\/?)>/g;
  return [...template.text.matchAll(tag)].map((match) => {
    const line = source.slice(0, template.offset + match.index).split('\n').length;
    const after = template.text.slice(match.index + match[0].length);
    const content = match[2] === '/' ? '' : after.slice(0, Math.max(after.indexOf('</mat-icon>'), 0));
    return { where: `${relative(ROOT, template.file)}:${line}`, attributes: match[1], content };
  });
}

const allTags = templates.flatMap(iconTags);

const STATIC_ICON = /(?:^|\s)svgIcon="([^"]*)"/;
const BOUND_ICON = /\[svgIcon\]="([^"]*)"/;

/** Names the app uses: static svgIcon values, quoted names in [svgIcon] bindings, and `icon: '…'` in TS data. */
function usedNames(): Map<string, string> {
  const used = new Map<string, string>();
  for (const { where, attributes } of allTags) {
    const fixed = STATIC_ICON.exec(attributes)?.[1];
    if (fixed !== undefined) used.set(fixed, where);
    const bound = BOUND_ICON.exec(attributes)?.[1] ?? '';
    // Quoted names in the binding, less those it compares against ("h.db === 'up' ? … : …").
    for (const match of bound.matchAll(/'([^']*)'/g)) {
      const before = bound.slice(0, match.index);
      const after = bound.slice(match.index + match[0].length);
      if (!/[=!]==?\s*$/.test(before) && !/^\s*[=!]==?/.test(after)) used.set(match[1], where);
    }
  }
  for (const file of appFiles.filter((path) => path.endsWith('.ts'))) {
    for (const [, name] of readFileSync(file, 'utf8').matchAll(/\bicon:\s*'([^']+)'/g)) {
      used.set(name, relative(ROOT, file));
    }
  }
  return used;
}

describe('icons', () => {
  it('finds the templates and their icons (so the checks below look at something)', () => {
    expect(components.length).toBeGreaterThan(30);
    expect(allTags.length).toBeGreaterThan(100);
  });

  it('the hand-kept list is sorted and has no name twice', () => {
    expect([...ICON_NAMES]).toEqual([...new Set(ICON_NAMES)].sort());
  });

  it(`${ICON_SVGS_PATH} is up to date with the list (npm run -s generate:icons)`, () => {
    expect(Object.keys(ICON_PATHS), 'run npm run -s generate:icons').toEqual([...ICON_NAMES]);
    const committed = readFileSync(join(ROOT, ICON_SVGS_PATH), 'utf8');
    expect(committed === iconSource(), 'run npm run -s generate:icons').toBe(true);
  });

  it('every <mat-icon> names an SVG icon and holds no ligature text', () => {
    const wrong = allTags
      .filter(({ attributes, content }) => {
        const named = STATIC_ICON.test(attributes) || BOUND_ICON.test(attributes);
        return !named || content.trim() !== '';
      })
      .map(({ where, attributes, content }) => `${where}: <mat-icon${attributes}>${content.trim()}`);
    expect(wrong, 'write <mat-icon svgIcon="name" /> or [svgIcon]="…"').toEqual([]);
  });

  it('every component with a <mat-icon> imports ICONS, so ng build checks its icon names', () => {
    const wrong = components
      .filter(({ template }) => template.text.includes('<mat-icon'))
      .filter(({ source }) => {
        const importsIcons = /import \{ ICONS \} from '[./]+(?:core\/)?icons\/shipped-icon';/.test(source);
        const usesIcons = /\bimports:\s*\[[^\]]*\.\.\.ICONS\b/.test(source);
        const bareMatIcon = /\bMatIcon(Module)?\b/.test(source);
        return !importsIcons || !usesIcons || bareMatIcon;
      })
      .map(({ file }) => relative(ROOT, file));
    expect(wrong, "import { ICONS } from '…/core/icons/shipped-icon' and put ...ICONS in imports").toEqual(
      [],
    );
  });

  it("Angular Material's own ligature icons are replaced: only the stepper has any, and each stepper says so", () => {
    // Material components that write icon-font text into a <mat-icon> of their own would show the
    // bare word now that no icon font ships. Today that is the stepper's mark for a finished step
    // (its "done" and "error" marks need options the app does not set).
    const material = join(ROOT, 'node_modules/@angular/material/fesm2022');
    const withLigatures = readdirSync(material)
      .filter((file) => file.endsWith('.mjs'))
      .filter((file) => /<mat-icon[^>]*>[^<]+<\/mat-icon>/.test(readFileSync(join(material, file), 'utf8')));
    expect(withLigatures).toEqual(['stepper.mjs']);
    const steppers = templates.filter(({ text }) => text.includes('<mat-stepper'));
    expect(steppers.length).toBeGreaterThan(0);
    for (const { file, text } of steppers) {
      expect(text, `${relative(ROOT, file)}: add <ng-template matStepperIcon="edit">`).toMatch(
        /<ng-template matStepperIcon="edit">\s*(<span[^>]*>[^<]*<\/span>\s*)?<mat-icon svgIcon=/,
      );
    }
  });

  it('every icon used is shipped, and every icon shipped is used', () => {
    const used = usedNames();
    const shipped = new Set<string>(ICON_NAMES);
    const unshipped = [...used]
      .filter(([name]) => !shipped.has(name))
      .map(([name, where]) => `${name} (${where})`);
    expect(unshipped, 'add the name to src/app/core/icons/icon-names.ts').toEqual([]);
    const unused = ICON_NAMES.filter((name) => !used.has(name));
    expect(unused, 'remove the name from src/app/core/icons/icon-names.ts and regenerate').toEqual([]);
  });
});
