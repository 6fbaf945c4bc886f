// What an export was made from, carried inside every JSON and GeoJSON export so the file says how
// its figures came about: the date planned for, the vehicle class, the input files and the what-if
// scenario (null = the contract as loaded).

export interface ExportSettings {
  /** ISO 8601 date planned for; null = every lane regardless of validity. */
  date: string | null;
  /** Vehicle class whose tolls apply; null = the file's default. */
  vehicle_class: string | null;
  /** Input file names, depots first. */
  files: string[];
  scenario: string | null;
}
