import {
  adviceSentence,
  compassLetter,
  compassWord,
  drillWords,
  formatHeight,
  formatInchFraction,
} from './advice-words';

describe('advice in words', () => {
  it('names the nearest of eight compass points, wrapping past north', () => {
    expect([0, 44, 46, 180, 200.1, 337, 359.9].map(compassWord)).toEqual([
      'north',
      'north-east',
      'north-east',
      'south',
      'south',
      'north-west',
      'north',
    ]);
    expect(compassLetter(80.4)).toBe('E');
  });

  it('gives heights in feet and inches to the nearest inch, or in metres to the centimetre', () => {
    expect(formatHeight(110, 'imperial')).toBe('3 ft 7 in');
    expect(formatHeight(121.9, 'imperial')).toBe('4 ft'); // 47.99 in rounds up to a whole 4 ft
    expect(formatHeight(25, 'imperial')).toBe('10 in');
    expect(formatHeight(110, 'metric')).toBe('1.10 m');
    expect(formatHeight(99.9, 'metric')).toBe('1.00 m');
  });

  it('writes depths as a tape reads them and bits as they are sold (1 in = 2.54 cm, NIST SP 811)', () => {
    expect(formatInchFraction(1.75)).toBe('1 3/4 in');
    expect(formatInchFraction(2)).toBe('2 in');
    expect(formatInchFraction(0.5)).toBe('1/2 in');
    expect(drillWords(2.54 * (5 / 16), 4.445, 'imperial')).toBe(
      '5/16 in bit, 1 3/4 in deep including bark',
    );
    expect(drillWords(2.54 * (7 / 16), 5.08, 'metric')).toBe(
      '11.1 mm bit, 5.1 cm deep including bark',
    );
  });

  it('says once, twice, and in words what a resting or unmeasured tree needs', () => {
    const spot = { azimuthDeg: 180, heightCm: 100 };
    expect(adviceSentence({ verdict: 'tap', placements: [spot] }, 2027, 'metric')).toBe(
      'Tap once: south at 1.00 m.',
    );
    expect(adviceSentence({ verdict: 'too-small', placements: [] }, 2027, 'metric')).toBe(
      'Too small to tap in 2027. Let it grow.',
    );
    expect(adviceSentence({ verdict: 'unmeasured', placements: [] }, 2027, 'metric')).toMatch(
      /^Measure the DBH first/,
    );
  });
});
