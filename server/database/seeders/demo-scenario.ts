/**
 * The demo scenario: Quillmere Microwave Lab, an invented RF lab, with invented
 * people and projects. Passwords are for local demos only (listed in README).
 */
export const DEMO_PASSWORD = 'quillmere-demo-2026'

export const demoPeople = [
  { key: 'ines', email: 'ines@quillmere.example', name: 'Ines Okafor-Lund', isAdmin: false },
  { key: 'tomas', email: 'tomas@quillmere.example', name: 'Tomas Reyvik', isAdmin: false },
  { key: 'priya', email: 'priya@quillmere.example', name: 'Priya Castellane', isAdmin: false },
  { key: 'jun', email: 'jun@quillmere.example', name: 'Jun Marlowe', isAdmin: false },
  { key: 'ada', email: 'ada@quillmere.example', name: 'Ada Penhallow', isAdmin: true },
] as const

export type DemoPersonKey = (typeof demoPeople)[number]['key']

export const demoProjects = [
  {
    key: 'beam',
    name: 'Beam-switch feed, S-band',
    description: 'Four-beam switched feed for the lab\'s 2.45 GHz patch-array test bench: hybrids, crossovers and phase lines.',
    members: { ines: 'owner', tomas: 'editor', priya: 'reviewer', jun: 'viewer' },
  },
  {
    key: 'balanced',
    name: 'Balanced LNA hybrids',
    description: 'Input and output quadrature hybrids for the balanced low-noise stage of the lab receiver.',
    members: { tomas: 'owner', ines: 'reviewer' },
  },
] as const
