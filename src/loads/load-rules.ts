// The rules by which loads are found, stated once so the package prints the same words
// the code applies. Each names its source or says it is an assumption to verify.
export const RULES = {
  memberWind:
    'cross-flow (normal-component) principle: only the wind component normal to the member axis acts; force per length p D sin²θ (θ = angle between wind and axis), normal to the axis in the plane of the wind and the axis (Hoerner, Fluid-Dynamic Drag, 1965, ch. 3, from memory); verify against the governing code',
  memberWindProjected:
    'projected-area rule: the pressure acts on the member area projected onto a plane normal to the wind, D × L sin θ, in the wind direction; force per length p D sin θ (AASHTO LRFD-LTS practice, from memory); verify against the governing code',
  memberWindDiameter: 'pressure × local outside diameter (across flats for multisided), varying linearly along each element',
  panelWind:
    'cosine rule: force normal to the panel face, p × width × height × cos α (α = plan angle between the wind and the face normal); assumption, verify against the governing code',
  pointWind: 'pressure × effective projected area entered for the attachment, in the wind direction, the same for every direction (input; no side area given)',
  pointWindSides: 'pressure × (A_face |cos α| + A_side |sin α|), α the plan angle between the wind and the face normal, in the wind direction (a projection of the two areas, common practice; verify against the governing code)',
  offsetMoment: 'a force acting at an offset r from the member axis is applied on the axis with the moment r × F (rigid bracket)',
  selfWeight: 'steel area × density × g along the taper, varying linearly along each element',
  iceMembers: 'ice weight per area × outside perimeter of the member (all round the surface)',
  icePanels:
    'ice weight per area × one face of the panel (AASHTO LRFD-LTS ice provision, one face of sign panels; from memory), verify against the governing code',
  icePoints:
    'ice weight per area × the effective projected wind area of the attachment (polebook assumption for attachments whose surface area is not given; typical value, verify against the governing code)',
  iceWind: 'design wind pressures × the ice wind factor (input)',
} as const;
