import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';
import { LocalDiskStorage } from '../../../server/storage/local-disk-storage';
import { fileStorageContract } from './storage-contract';

const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-disk-store-'));
const store = new LocalDiskStorage(dir);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

fileStorageContract('local disk', () => store);
