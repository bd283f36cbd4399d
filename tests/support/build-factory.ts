import { Build } from '@server/models/build';
import { randomBuildCode } from '@server/services/build-codes';

/** A bare draft build owned by `ownerId`, made straight through the model (no API round trip). */
export async function createBuild(ownerId: number, overrides: Partial<{ title: string; published: boolean }> = {}) {
  return Build.create({
    ownerId,
    code: randomBuildCode(),
    title: overrides.title ?? 'Test build',
    modelYear: null,
    bodyOrigin: null,
    style: null,
    weight: null,
    vin: null,
    plate: null,
    ownerPhone: null,
    ownerAddress: null,
    ...(overrides.published !== undefined ? { published: overrides.published } : {}),
  });
}
