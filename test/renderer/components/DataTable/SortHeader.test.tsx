// The sortable heading the results and loads tables share: aria-sort and the arrow follow the query.

import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { SortHeader, sortOf } from '../../../../renderer/components/DataTable/SortHeader';

const heading = (sort: 'ascending' | 'descending' | 'none', numeric = false) => renderToStaticMarkup(<SortHeader label="Cost" numeric={numeric} sort={sort} onSort={() => {}} />);

describe('SortHeader', () => {
  it('states the sort of its column and marks it for sighted users', () => {
    expect(sortOf({ sortKey: 'cost', descending: true }, 'cost')).toBe('descending');
    expect(sortOf({ sortKey: 'cost', descending: false }, 'cost')).toBe('ascending');
    expect(sortOf({ sortKey: 'depot', descending: true }, 'cost')).toBe('none');
    expect(heading('descending', true)).toBe('<th scope="col" aria-sort="descending" class="lw-num"><button type="button" class="lw-sort">Cost<span aria-hidden="true"> ▼</span></button></th>');
    expect(heading('ascending')).toContain('aria-sort="ascending"');
    expect(heading('ascending')).toContain('<span aria-hidden="true"> ▲</span>');
    expect(heading('none')).toContain('<span aria-hidden="true"></span>');
  });
});
