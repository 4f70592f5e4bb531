// The app's one source of "now", injected so tests can move time on instead of sleeping.
export type Clock = () => Date;

export const systemClock: Clock = () => new Date();
