import { linkSegments } from './link-segments';

describe('linkSegments', () => {
  it('turns http and https URLs into links and keeps the text around them', () => {
    expect(
      linkSegments('Open https://tw.example/reset-password?token=a_B-1 within 60 minutes.'),
    ).toEqual([
      { text: 'Open ' },
      {
        text: 'https://tw.example/reset-password?token=a_B-1',
        href: 'https://tw.example/reset-password?token=a_B-1',
      },
      { text: ' within 60 minutes.' },
    ]);
  });

  it('leaves sentence punctuation after a link outside it', () => {
    expect(linkSegments('See http://localhost:3000/x.')).toEqual([
      { text: 'See ' },
      { text: 'http://localhost:3000/x', href: 'http://localhost:3000/x' },
      { text: '.' },
    ]);
  });

  it('never makes a link of other schemes', () => {
    expect(linkSegments('javascript:alert(1) and ftp://host/file')).toEqual([
      { text: 'javascript:alert(1) and ftp://host/file' },
    ]);
  });
});
