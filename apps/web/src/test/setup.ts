// Runs before every web test file. Tests wait for what they expect to see, never for a time:
// findBy*/waitFor give up only after 10 s, so a loaded machine makes them slower, not red.
import { configure } from '@testing-library/react';

configure({ asyncUtilTimeout: 10_000 });
