/** Shown wherever a panel can reach a real robot. */
export function SafetyCaution() {
  return (
    <aside aria-label="Safety" className="overflow-hidden rounded-xl bg-signal-950 ring-1 ring-signal-500/50">
      <div aria-hidden="true" className="hazard-edge h-2" />
      <div className="p-5">
        <h2 className="text-lg font-semibold text-signal-200">A panel connected to a real robot can make it move</h2>
        <ul className="mt-2 flex list-disc flex-col gap-1 pl-5 text-[0.9375rem] text-asphalt-200">
          <li>Pitwall never replaces the driver station’s enable, disable or emergency stop. Keep a hand near them.</li>
          <li>Clear the robot’s space before anyone taps a live panel, in the pit as on the field.</li>
          <li>
            The current game manual and the event’s rules come first — including what may be wired to the driver
            station — and so do your team’s safety mentors.
          </li>
        </ul>
      </div>
    </aside>
  );
}
