/** Every route of the studio in one place, so links and the router agree. */
export const paths = {
  home: '/',
  status: '/status',
} as const;
