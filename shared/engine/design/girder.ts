import { repetitiveApplies } from '../lumber';

/**
 * Whether the repetitive member factor Cr applies to the chords (NDS 2018 §4.3.9: members 2–4
 * in. thick, in contact or at most 24 in. o.c., at least 3 of them, joined by a load-distributing
 * element). A single-ply truss: by its spacing. A girder carries other trusses and shares its
 * load with no neighbour, so only its own plies can qualify: 3 or more plies fastened together
 * get Cr, a 2-ply girder does not (2 members are fewer than 3; conservative, from memory of the
 * clause's wording).
 */
export function girderRepetitive(spacingMm: number, plies: number): boolean {
  return plies >= 2 ? plies >= 3 : repetitiveApplies(spacingMm);
}

/** Notes of a multi-ply design: what the plies share and how the checks count them. */
export function girderNotes(plies: number): string[] {
  if (plies < 2) return [];
  return [
    `Girder of ${plies} plies: member capacities and stiffness with all ${plies} plies side by side (fastened as below); weak-axis slenderness of one ply. ` +
      (plies >= 3
        ? 'Repetitive member factor Cr = 1.15 on chord bending: 3 or more plies in contact, joined by the ply fastening (NDS 2018 §4.3.9).'
        : 'No repetitive member factor: a 2-ply girder has fewer than 3 members in contact (NDS 2018 §4.3.9).'),
    `Plates: each ply is a truss of its own with plates on both faces, sized for 1/${plies} of each member force.`,
    'Hung loads are taken on one face ply; the ply-to-ply fastening carries (n − 1)/n of each into the other plies. Webs: nail plies together as the chords (common practice).',
  ];
}
