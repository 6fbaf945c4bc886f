// Stands in for the rows a windowed table leaves out, so the scrollbar keeps the full table's
// length. Hidden from assistive technology: the table's aria-rowcount tells the real size.

export function SpacerRow({ heightPx, columns }: { heightPx: number; columns: number }) {
  if (heightPx <= 0) return null;
  return (
    <tr aria-hidden="true" className="lw-spacer">
      <td colSpan={columns} style={{ height: heightPx, padding: 0, border: 0 }} />
    </tr>
  );
}
