/** Every client URL in one place; components never spell paths by hand. */
export const paths = {
  signIn: '/sign-in',
  prints: '/prints',
  newPrint: '/prints/new',
  deletedPrints: '/prints/deleted',
  print: (id: number | string) => `/prints/${id}`,
  editPrint: (id: number | string) => `/prints/${id}/edit`,
  papers: '/papers',
  negatives: '/negatives',
  places: '/places',
  toneWatch: '/tone-watch',
  toneRounds: '/tone-watch/rounds',
  toneImport: '/tone-watch/import',
  insights: '/insights',
  settings: '/settings',
} as const;
