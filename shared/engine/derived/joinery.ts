/**
 * The joinery schedule: each joint with both parts, the sizes of its features, and the set-ups
 * that cut them — router-table bit height and fence distance for grooves and rabbets, table-saw
 * blade height and fence for tongues, start and stop marks for stopped grooves.
 */
import type { Feature, JoineryRow, Joint, Part, SetUp } from '../types.ts';
import { featureSummary } from './featureSummary.ts';

const setting = (name: string, valueMm: number) => ({ name, valueMm });

/** Set-ups that cut one feature of `part`. */
export function setUpsFor(part: Part, feature: Feature): SetUp[] {
  switch (feature.type) {
    case 'groove':
      return [{ tool: 'router table', settings: [setting('straight bit diameter', feature.widthMm), setting('bit height', feature.depthMm), setting('fence to near side of bit', feature.offsetMm)], note: 'Reference face against the fence; one pass per part, the same set-up for every groove of this size.' }];
    case 'stopped-groove':
      return [{
        tool: 'router table',
        settings: [setting('straight bit diameter', feature.widthMm), setting('bit height', feature.depthMm), setting('fence to near side of bit', feature.offsetMm), setting('start mark from end-a', feature.startMm), setting('stop mark from end-a', feature.stopMm)],
        note: 'Mark the start and stop on the fence; lower the part onto the spinning bit at the start mark and lift it at the stop. Use stop blocks, keep hands clear of the bit, and read the router maker\'s safety instructions.',
      }];
    case 'tongue': {
      const cheek = (part.thicknessMm - feature.thicknessMm) / 2;
      const settings = [setting('blade height (cheek depth)', cheek), setting('fence to far side of blade (tongue length)', feature.lengthMm)];
      return [{ tool: 'table saw', settings, note: 'Cut both cheeks with the same set-up, reference faces flipped; test on scrap until the tongue slides into its groove by hand. Use a push block and the saw\'s guard where it can be used.' }];
    }
    case 'rabbet':
      return [{ tool: 'router table', settings: [setting('bit height (rabbet depth)', feature.depthMm), setting('fence to far side of bit (rabbet width)', feature.widthMm)], note: 'Rabbet all four edges with one set-up; check the tongue in a scrap groove.' }];
    case 'notch':
      return [{ tool: 'handsaw', settings: [setting('notch length', feature.lengthMm), setting('notch width', feature.widthMm)], note: 'Lay out from the part\'s edges; saw to the line and pare square.' }];
    case 'recess':
    case 'mortise':
      return [{ tool: 'router', settings: [setting('bit depth', feature.depthMm), setting('recess length', feature.lengthMm), setting('recess width', feature.widthMm)], note: 'Rout to the depth, square the corners with a chisel.' }];
    case 'dado':
      return [{ tool: 'table saw', settings: [setting('dado width', feature.widthMm), setting('blade height', feature.depthMm), setting('fence to near side', feature.offsetMm)], note: 'Dado stack; never cut a dado with the guard removed without a featherboard and push block.' }];
    case 'hole':
      return [{ tool: 'drill press', settings: [setting('bit diameter', feature.diameterMm), setting('depth', feature.depthMm)], note: 'Clamp the part; countersink for the screw head.' }];
    case 'slot':
      return [{ tool: 'router table', settings: [setting('straight bit diameter', feature.diameterMm), setting('fence to bit centre', feature.atMm[1]), setting('slot length', feature.slotLengthMm)], note: 'Plunge at one end, feed to the stop block, several shallow passes.' }];
  }
}

/** One schedule line per joint. */
export function joinerySchedule(parts: readonly Part[], joints: readonly Joint[]): JoineryRow[] {
  const byId = new Map(parts.map((p) => [p.id, p]));
  // A feature often serves several joints (a leg's groove holds a rail and a panel), and
  // writing its numbers as text is the dearest step here: each is written once.
  const summaries = new Map<Feature, string>();
  return joints.map((joint) => {
    const features: JoineryRow['features'][number][] = [];
    const setUps: SetUp[] = [];
    for (const member of joint.members) {
      const part = byId.get(member.partId);
      if (!part) continue;
      for (const id of member.featureIds) {
        const feature = part.features.find((f) => f.id === id);
        if (!feature) continue;
        let summary = summaries.get(feature);
        if (summary === undefined) {
          summary = featureSummary(feature);
          summaries.set(feature, summary);
        }
        features.push({ partId: part.id, featureId: id, summary });
        setUps.push(...setUpsFor(part, feature));
      }
    }
    return {
      jointId: joint.id, type: joint.type, parts: [joint.members[0].partId, joint.members[1].partId],
      count: joint.count, features, setUps, clearanceMm: joint.clearanceMm, glued: joint.glued, floating: joint.floating,
    };
  });
}
