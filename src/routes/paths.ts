/** Every page's path in one typed table; links and the router both read it. */
export const paths = {
  home: '/',
  signIn: '/signin',
  register: '/register',
  resetPassword: '/reset-password',
  workshops: '/workshops',
  workshop: '/workshops/:workshopId',
  newDesign: '/workshops/:workshopId/new',
  design: '/designs/:designId',
  compare: '/designs/:designId/compare',
  materials: '/designs/:designId/materials',
} as const;

export type PathName = keyof typeof paths;

/** Concrete addresses for the paths that take parameters. */
export const linkTo = {
  workshop: (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`,
  newDesign: (workshopId: string, kind?: string) => `/workshops/${encodeURIComponent(workshopId)}/new${kind ? `?kind=${encodeURIComponent(kind)}` : ''}`,
  design: (designId: string) => `/designs/${encodeURIComponent(designId)}`,
  compare: (designId: string, from: number, to: number) =>
    `/designs/${encodeURIComponent(designId)}/compare?from=${from}&to=${to}`,
  materials: (designId: string) => `/designs/${encodeURIComponent(designId)}/materials`,
  signIn: (next?: string) => (next ? `/signin?next=${encodeURIComponent(next)}` : '/signin'),
};

/** A `next` address is followed only when it stays inside the app. */
export function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : paths.workshops;
}
