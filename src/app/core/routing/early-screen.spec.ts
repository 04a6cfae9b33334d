import type { Routes } from '@angular/router';
import { routes } from '../../app.routes';
import { loadScreenEarly, routesFor } from './early-screen';

describe('routesFor', () => {
  it('finds the shell and the plan page for a plan address, in that order', () => {
    const chain = routesFor('/plans/7a1f', routes);
    expect(chain.map((r) => r.title ?? r.path)).toEqual(['', 'Plan · Conewise']);
  });

  it('prefers the longer address listed first (pitch-side) over the plan page', () => {
    expect(routesFor('/plans/7a1f/pitch-side', routes).map((r) => r.title)).toEqual([
      'Pitch-side · Conewise',
    ]);
  });

  it('ignores the query and fragment', () => {
    expect(routesFor('/join?x=1#secret', routes).map((r) => r.title ?? r.path)).toEqual([
      '',
      'Join your club · Conewise',
    ]);
  });

  it('finds nothing for an address only the catch-all takes', () => {
    expect(routesFor('/no/such/screen', routes)).toEqual([]);
  });

  it('finds the home screen inside the shell for /', () => {
    expect(routesFor('/', routes).map((r) => r.title ?? r.path)).toEqual(['', 'This week · Conewise']);
  });
});

describe('loadScreenEarly', () => {
  it('asks each matched route for its code once and survives a failed fetch', async () => {
    const asked: string[] = [];
    const table: Routes = [
      {
        path: '',
        loadComponent: () => {
          asked.push('frame');
          return Promise.reject(new Error('offline'));
        },
        children: [
          {
            path: 'a/:id',
            loadComponent: () => {
              asked.push('a');
              return Promise.resolve(class {});
            },
          },
          { path: 'b', loadComponent: () => (asked.push('b'), Promise.resolve(class {})) },
        ],
      },
    ];
    loadScreenEarly('/a/1', table);
    await Promise.resolve();
    expect(asked).toEqual(['frame', 'a']);
  });
});
