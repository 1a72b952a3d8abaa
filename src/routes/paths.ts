/** Every page's path in one typed table; links and the router both read it. */
export const paths = {
  home: '/',
} as const;

export type PathName = keyof typeof paths;
