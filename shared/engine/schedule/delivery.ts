/**
 * The delivery date a builder is told: the promised date while the plan makes it, else the date
 * the plan can make (or the planned finish when nothing was promised).
 */
export function plannedDelivery(o: {
  promisedOn: string | null;
  plannedFinishOn: string | null;
  plannedLate: boolean;
}): string | null {
  if (o.plannedFinishOn && (o.plannedLate || !o.promisedOn)) return o.plannedFinishOn;
  return o.promisedOn;
}
