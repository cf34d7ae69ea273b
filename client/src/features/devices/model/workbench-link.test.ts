import { describe, expect, it } from 'vitest';
import { prefillFromSearch, workbenchHref } from './workbench-link';

describe('the link that opens the scratch device page filled in', () => {
  it('reads back what it carries, in the form’s text, with gm/ID as the chosen constraint', () => {
    const href = workbenchHref({ processId: 'p-bf130g', version: 3, polarity: 'pmos', flavour: 'lvt', model: 'table', corner: 'SS', temperature: 125, l: 4.242640687119286e-7, gmId: 12.5, vds: 0.6, vsb: 0.2 });
    const start = prefillFromSearch(new URL(href, 'http://localhost').searchParams);
    expect(start.processId).toBe('p-bf130g');
    expect(start.version).toBe(3);
    // L keeps every digit, so a characterised length stays on the table's grid.
    expect(start.values).toEqual({ polarity: 'pmos', flavour: 'lvt', model: 'table', corner: 'SS', temperature: '125', l: '424.264068711929 nm', gmId: '12.5', vds: '600 mV', vsb: '200 mV', constraint: 'gmId' });
  });

  it('leaves out a standard flavour and anything a hand-edited link garbles, so those fields start from their defaults', () => {
    expect(workbenchHref({ processId: 'p', flavour: null })).toBe('/workbench?processId=p');
    const start = prefillFromSearch(new URLSearchParams('processId=p&version=1.5&polarity=cmos&model=bsim&l=abc&gmId=&vds=Infinity'));
    expect(start).toEqual({ processId: 'p', version: undefined, values: {} });
  });
});
