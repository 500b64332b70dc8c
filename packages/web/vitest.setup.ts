import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';

// Lazy route modules and chunks load on first use; on a busy machine that takes more than the default second.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => cleanup());
