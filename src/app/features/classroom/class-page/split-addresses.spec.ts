import { splitAddresses } from './split-addresses';

describe('splitAddresses', () => {
  it('splits on commas, semicolons, spaces and new lines, dropping blanks and repeats', () => {
    expect(splitAddresses(' a@x.test, b@x.test;\n\nc@x.test  a@x.test ')).toEqual([
      'a@x.test',
      'b@x.test',
      'c@x.test',
    ]);
  });

  it('gives nothing for an empty box', () => {
    expect(splitAddresses('  \n ')).toEqual([]);
  });
});
