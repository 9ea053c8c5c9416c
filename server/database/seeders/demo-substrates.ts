/**
 * Invented boards for the demo projects' substrate libraries. The names are our own and belong
 * to no real laminate; the values are plausible for PTFE- and hydrocarbon-type boards but are
 * demo data, not data sheets.
 */
export const demoSubstrates = {
  beam: [
    { name: 'Quillmere QL-350 0.508 mm', permittivity: 3.5, height: 0.508e-3, thickness: 35e-6, lossTangent: 0.0027, conductivity: 5.8e7, roughness: 0.8e-6, note: 'Invented demo board: the bench feed\'s default.' },
    { name: 'Quillmere QL-220 0.787 mm', permittivity: 2.2, height: 0.787e-3, thickness: 17.5e-6, lossTangent: 0.0009, conductivity: 5.8e7, roughness: 0.4e-6, note: 'Invented demo board: low-loss, for long phase lines.' },
    { name: 'Marrow Fen MF-615 0.635 mm', permittivity: 6.15, height: 0.635e-3, thickness: 17.5e-6, lossTangent: 0.0025, conductivity: 5.8e7, roughness: 0.6e-6, note: 'Invented demo board: high permittivity for compact hybrids.' },
  ],
  balanced: [
    { name: 'Quillmere QL-350 0.254 mm', permittivity: 3.5, height: 0.254e-3, thickness: 17.5e-6, lossTangent: 0.0027, conductivity: 5.8e7, roughness: 0.8e-6, note: 'Invented demo board: thin, for the LNA input hybrid.' },
  ],
} as const
