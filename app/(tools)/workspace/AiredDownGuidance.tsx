/** Aired-down trail guidance: common practice, no source — said on the screen, with the limits that always apply. */
export function AiredDownGuidance() {
  return (
    <section aria-labelledby="aired-down-title" className="rounded-lg bg-basalt-50 px-4 py-3 text-sm text-basalt-800">
      <h3 id="aired-down-title" className="font-semibold">
        On the trail: airing down <span className="font-normal text-basalt-600">(common practice, no source)</span>
      </h3>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        <li>Lower pressure lengthens the footprint for grip on rock, sand and snow; go down in steps and drive slowly.</li>
        <li>Beadlocks (or bead-retaining wheels) let you go lower: without them a tire can leave its bead seat at low pressure.</li>
        <li>Never go below what the tire maker and the wheel maker allow for off-road use; the figures above are road pressures.</li>
        <li>Air back up to the road pressure before driving on the road, and check it cold.</li>
      </ul>
    </section>
  );
}
