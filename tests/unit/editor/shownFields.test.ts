import { describe, expect, it } from 'vitest';
import { defaultSpec, paramDefs } from '../../../shared/engine/params.ts';
import { shownFields } from '../../../src/editor/shownFields.ts';

describe('shownFields', () => {
  it('leaves out the chest\'s finger-notch sizes once the notch is turned off', () => {
    const defs = paramDefs('chest');
    const spec = defaultSpec('chest');
    const keys = (params: typeof spec.params) => shownFields(defs, params, null).map((d) => d.key);
    expect(keys(spec.params)).toContain('fingerNotchWidth');
    expect(keys({ ...spec.params, fingerNotch: false })).not.toContain('fingerNotchWidth');
    expect(keys({ ...spec.params, fingerNotch: false })).toContain('fingerNotch');
  });

  it('reads a missing value as its default', () => {
    const defs = paramDefs('cabinet');
    // The default cabinet has doors, so the door style shows even when the spec leaves the count out.
    expect(shownFields(defs, {}, null).map((d) => d.key)).toContain('doorStyle');
  });

  it('keeps a hidden field the engine names, so the value that stops the build can be reached', () => {
    const defs = paramDefs('dresser');
    const params = { ...defaultSpec('dresser').params, drawerGraduation: 'equal' };
    expect(shownFields(defs, params, null).map((d) => d.key)).not.toContain('graduationStep');
    expect(shownFields(defs, params, 'graduationStep').map((d) => d.key)).toContain('graduationStep');
  });
});
