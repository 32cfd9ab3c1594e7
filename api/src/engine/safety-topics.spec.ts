import { CAUTION_LEVELS, detectSafetyTopics, SAFETY_TOPICS, standardCautions } from './safety-topics';

// Sentences written for these tests (an invented shop session), not taken from any real guide or video.
describe('detectSafetyTopics', () => {
  it.each([
    ['Put the truck on axle stands before you start.', ['lifting']],
    ['Raise the pickup at the front crossmember and slide the jack out.', ['lifting']],
    ['Spin it up slowly and watch the coupler for wobble.', ['rotating_parts']],
    ['Check the driveshaft angle once it is back in.', ['rotating_parts']],
    // Widened after a guide about couplers and shafts raised no rotating-parts caution.
    ['Slide the coupler onto the motor shaft and tighten the grub screw.', ['rotating_parts']],
    ['The coupling takes up the misalignment between the two shafts.', ['rotating_parts']],
    ['Mark the prop shaft flange before you drop it.', ['rotating_parts']],
    ['Grease the universal joints on the driveshafts.', ['rotating_parts']],
    ['Check the CV joint boots for splits.', ['rotating_parts']],
    ['Fit the crankshaft pulley and the new drive belt.', ['rotating_parts']],
    ['Bump the motor over to line up the splines.', ['rotating_parts']],
    ['At 3,000 rpm the coupler should run true.', ['rotating_parts']],
    ['The input shaft needs a new pilot bearing.', ['rotating_parts']],
    ['Disconnect the traction battery first; the pack sits at 400 V.', ['high_voltage']],
    ['The orange cables run under the bed to the inverter.', ['high_voltage']],
    ['Tack it in place, then MIG weld the gusset.', ['welding']],
    ['Press the pilot bearing in with the arbor press and a flat driver.', ['pressing']],
    ['It is a press-fit, so support the inner race.', ['pressing']],
    ['Heat the ring gear in the oven and drop it on.', ['pressing']],
    ['A shrink fit holds the sleeve without a key.', ['pressing']],
  ])('finds the topic in %j', (text, topics) => {
    expect(detectSafetyTopics(text)).toEqual(topics);
  });

  it.each([
    'Press the button on the meter to hold the reading.',
    'The 12 V accessory battery stays connected.', // 60 V DC is the usual hazardous-voltage line (common practice)
    'Lift the lid of the parts box and count the bolts.',
    'Note the part number and the spline count.',
    // Decoys: the same words about things that do not turn under power.
    'Keep the screwdriver shaft clean of grease.',
    'Hook the trailer coupler over the tow ball.',
    'Push the air hose coupling onto the line.',
    'The coupling nut on the brake line is finger tight.',
    'A shaft of sunlight fell across the bench.',
    'Heat the workshop before the paint goes on.',
    'The lift shaft in the old mill is boarded over.',
  ])('finds nothing in %j', (text) => {
    expect(detectSafetyTopics(text)).toEqual([]);
  });

  it('reports several topics in their fixed order', () => {
    expect(detectSafetyTopics('Weld the bracket, then jack the truck up and press the bush in.')).toEqual([
      'lifting',
      'welding',
      'pressing',
    ]);
  });
});

describe('standardCautions', () => {
  it('puts the most severe signal word first (ANSI Z535 order DANGER, WARNING, CAUTION, NOTICE)', () => {
    const cautions = standardCautions(['lifting', 'high_voltage']);
    expect(cautions.map((caution) => [caution.topic, caution.level])).toEqual([
      ['high_voltage', 'DANGER'],
      ['lifting', 'WARNING'],
    ]);
  });

  it('gives each topic once and a caution for every topic', () => {
    expect(standardCautions(['welding', 'welding'])).toHaveLength(1);
    const all = standardCautions(SAFETY_TOPICS);
    expect(all.map((caution) => caution.topic).sort()).toEqual([...SAFETY_TOPICS].sort());
    for (const caution of all) {
      expect(CAUTION_LEVELS).toContain(caution.level);
      expect(caution.text.length).toBeGreaterThan(40);
    }
  });
});
