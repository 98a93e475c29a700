/** Where the app under test runs and who the demo seed created. */
export const demo = {
  url: (process.env.SOJOURN_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, ''),
  password: process.env.DEMO_PASSWORD ?? 'sojourn-demo',
  users: {
    admin: 'admin@sojourn.test',
    partner: 'partner@sojourn.test',
    consultant: 'consultant@sojourn.test',
    client: 'client@sojourn.test',
  },
} as const;

export type DemoRole = keyof typeof demo.users;
