// Whether the demo seed has finished (read by /api/health, so `npm start` can wait for it).
export const demoState: { status: 'off' | 'seeding' | 'ready' | 'failed' } = { status: 'off' }
