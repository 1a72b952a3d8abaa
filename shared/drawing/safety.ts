/**
 * Safety notes: the usual cautions for the finished piece and for the machines and finishes
 * used to build it. They defer to local codes, product standards and the makers' manuals; a
 * plan set never says a piece is certified safe.
 */
import type { PieceResult } from '../engine/types.ts';
import type { FlowBlock } from './types.ts';

/** The safety blocks for `result`. */
export function safetyBlocks(result: PieceResult): FlowBlock[] {
  const piece: string[] = [];
  if (result.kind === 'chest') {
    piece.push(
      'A chest lid can fall on a child\'s head or fingers, and a child can climb inside. Fit lid supports that hold the lid open in any position and need no adjustment.',
      'Leave ventilation a wall or a blanket cannot block, and fit no latch or lock that a child could close from outside.',
      'Toy chests are covered by the toy-chest requirements of ASTM F963 (formerly ASTM F834) and by CPSC guidance; blanket and cedar chests by ASTM F2598. Check the current editions and the rules where the chest will be used.',
    );
  }
  if (result.kind === 'dresser' || result.kind === 'cabinet') {
    piece.push(
      'Tall and drawered furniture can tip over onto a child. Anchor it to the wall with a tip-over restraint into the framing, and keep heavy items in the lowest drawers.',
      'Clothing storage units fall under the tip-over stability requirements of ASTM F2057 and the federal rule that adopted them in the United States; check the current rules where the piece will be used.',
    );
  }
  if (result.kind === 'cabinet') piece.push('Hang wall cabinets on fasteners into studs or blocking rated for the load; never on drywall anchors alone.');

  return [
    {
      type: 'text', title: 'Safety notes', bullets: true,
      paragraphs: [
        ...piece,
        'These notes are the usual cautions, not a certification: this design has not been tested or certified as safe. Local codes, product standards and licensed professionals govern.',
      ],
    },
    {
      type: 'text', title: 'In the shop', bullets: true,
      paragraphs: [
        'Table saw: use the blade guard and riving knife; a push stick for narrow rips; never cut freehand; stand out of line of the blade. Cut grooves and rabbets with the guard the saw maker provides for non-through cuts, or on the router table.',
        'Router table: feed against the bit\'s rotation; use the fence, featherboards and push blocks; take deep grooves in several passes; unplug the router to change bits.',
        'Wear eye and hearing protection at every machine, and dust extraction or a respirator for sanding. Oak and other hardwood dusts are sensitisers and may cause cancer.',
        'Spray finishing: spray only with ventilation that carries vapour away from you and from ignition sources, wear a respirator rated for organic vapours, and keep flames and sparks away. Spray booths are governed by fire codes.',
        'Oily rags can heat up and catch fire by themselves: lay them flat to dry outdoors or keep them in a closed metal can filled with water.',
        'Follow each machine\'s and product\'s manual; they govern where they differ from these notes.',
      ],
    },
  ];
}
