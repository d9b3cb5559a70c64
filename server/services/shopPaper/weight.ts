const KG_PER_LB = 0.45359237;

/**
 * A truss weight (the engine's `trussLumberMassKg`, kg) in the plant's units: whole lb or
 * kg, with its text ("est. 112 lb").
 */
export function weightIn(kg: number, units: 'imperial' | 'metric') {
  const value = units === 'metric' ? Math.round(kg) : Math.round(kg / KG_PER_LB);
  const unit = units === 'metric' ? ('kg' as const) : ('lb' as const);
  return { value, unit, text: `est. ${value.toLocaleString('en-US')} ${unit}` };
}
