/**
 * A field of the workshop's stock named as the Materials page shows it: `boardsInStock[1]
 * .defects[0].lengthMm` reads "Board on hand 2, defect 1: length".
 */

const FIELDS: Readonly<Record<string, string>> = {
  sheetLengthMm: 'Sheet length',
  sheetWidthMm: 'Sheet width',
  boardLengthsMm: 'Board lengths for sale',
  boardWidthsMm: 'Board widths for sale',
  kerfMm: 'Kerf',
  trimMm: 'Edge trim',
  offcuts: 'Offcuts',
  boardsInStock: 'Boards on hand',
};

const PARTS: Readonly<Record<string, string>> = {
  lengthMm: 'length',
  widthMm: 'width',
  fromEndMm: 'from the end',
  fromEdgeMm: 'from the edge',
  speciesId: 'species',
  quarters: 'thickness',
  label: 'label',
  count: 'how many',
  sheetId: 'sheet good',
  kind: 'kind',
  defects: 'defects',
};

/** The words for `path` (keys and indexes, as zod gives them). */
export function stockFieldName(path: readonly (string | number)[]): string {
  const [top, index, field, defect, defectField] = path;
  if (typeof top !== 'string') return 'Stock';
  const what = FIELDS[top] ?? top;
  if (typeof index !== 'number') return what;
  if (top === 'boardLengthsMm' || top === 'boardWidthsMm') return `${what}, size ${index + 1}`;
  const row = `${top === 'offcuts' ? 'Offcut' : 'Board on hand'} ${index + 1}`;
  if (typeof field !== 'string') return row;
  if (field === 'defects' && typeof defect === 'number') {
    return typeof defectField === 'string' ? `${row}, defect ${defect + 1}: ${PARTS[defectField] ?? defectField}` : `${row}, defect ${defect + 1}`;
  }
  return `${row}: ${PARTS[field] ?? field}`;
}
