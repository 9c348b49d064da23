import type { ChannelDerived } from "@/lib/stim";
import { figureGroups } from "./figure-groups";

// One table per group: the row header carries the figure's name and its plain explanation, the cell its value,
// so a screen reader reads "Pulse period … 28,571 µs" as one row.
export function DerivedFigures({ derived }: { derived: ChannelDerived }) {
  return (
    <div className="flex flex-col gap-5">
      {figureGroups(derived).map((group) => (
        <table key={group.id} className="w-full border-collapse">
          <caption className="pb-1 text-left text-lg font-bold">{group.title}</caption>
          <tbody>
            {group.rows.map((row) => (
              <tr key={row.id} className="border-t border-line-soft align-top">
                <th scope="row" className="py-2 pr-3 text-left font-normal">
                  <span className="block font-bold">{row.label}</span>
                  <span className="block text-sm text-ink-soft">{row.explanation}</span>
                </th>
                <td className="whitespace-nowrap py-2 text-right text-lg font-bold tabular-nums">{row.value}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ))}
    </div>
  );
}
