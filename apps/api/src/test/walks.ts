// The scripted walks live with the demo seed, which walks its finished cases with them.
export * from '../db/seeders/demo-walks';
