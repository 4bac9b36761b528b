/** One region of the picker ("Europe") with its zones, labelled the way people read them ("Isle of Man (Europe)"). */
export interface ZoneGroup {
  region: string;
  zones: { value: string; label: string }[];
}

/** The runtime's zones grouped by region, with UTC first; `current` is kept even if the runtime lacks it. */
export function timeZoneGroups(current: string, zones: readonly string[] = Intl.supportedValuesOf("timeZone")): ZoneGroup[] {
  const all = new Set(zones);
  all.add(current);
  all.delete("UTC");
  const groups = new Map<string, ZoneGroup["zones"]>();
  for (const zone of [...all].sort()) {
    const slash = zone.indexOf("/");
    const region = slash === -1 ? "Other" : zone.slice(0, slash);
    const place = (slash === -1 ? zone : zone.slice(slash + 1)).replaceAll("_", " ").replaceAll("/", ", ");
    if (!groups.has(region)) groups.set(region, []);
    // The region again in the label, since a closed select shows the option alone.
    groups.get(region)!.push({ value: zone, label: slash === -1 ? place : `${place} (${region})` });
  }
  return [{ region: "Universal", zones: [{ value: "UTC", label: "UTC" }] }, ...[...groups].map(([region, z]) => ({ region, zones: z }))];
}
