/** A small table's header row: the column names, small capitals, left-aligned. */
export function ColumnHeads({ names }: { names: string[] }) {
  return (
    <tr className="text-left text-xs uppercase tracking-wide text-basalt-600">
      {names.map((n, i) => (
        <th key={n} scope="col" className={i < names.length - 1 ? "pb-1 pr-3" : "pb-1"}>
          {n}
        </th>
      ))}
    </tr>
  );
}
