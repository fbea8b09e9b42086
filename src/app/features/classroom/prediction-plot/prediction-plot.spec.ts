import { TestBed } from '@angular/core/testing';
import { QuestionSchema, type StudentAnswer } from '../../../../../shared/contracts/classroom';
import { PredictionPlot } from './prediction-plot';

const period = QuestionSchema.parse({
  kind: 'bed-period',
  id: 'p',
  prompt: 'Period?',
  bedId: 'bed',
  tolerance: 0.2,
});
const regime = QuestionSchema.parse({
  kind: 'bed-regime',
  id: 'r',
  prompt: 'Start?',
  bedId: 'bed',
});

function answer(
  name: string,
  predicted: number | 'cycling' | 'spill-stall',
  correct: boolean,
  questionId: string,
): StudentAnswer {
  return {
    userId: `00000000-0000-4000-8000-00000000000${name.length}`,
    name,
    predictions: [],
    outcomes: [{ questionId, predicted, simulated: null, correct, difference: null }],
    submittedAt: '2030-01-01T00:00:00.000Z',
    ranAt: null,
  };
}

async function render(inputs: Record<string, unknown>): Promise<SVGSVGElement> {
  const fixture = TestBed.createComponent(PredictionPlot);
  for (const [name, value] of Object.entries(inputs)) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  const svg = (fixture.nativeElement as HTMLElement).querySelector('svg');
  if (!svg) throw new Error('No plot drawn.');
  return svg;
}

describe('PredictionPlot', () => {
  it('draws one dot per prediction in minutes, the simulated line and the band, coloured right or wrong', async () => {
    const svg = await render({
      question: period,
      answers: [
        answer('Sam', 480, true, 'p'),
        answer('Kim', 120, false, 'p'),
        answer('Lee', 500, true, 'p'),
      ],
      simulated: 472,
    });
    expect(svg.querySelectorAll('circle.dot')).toHaveLength(3);
    expect(svg.querySelectorAll('circle.right')).toHaveLength(2);
    expect(svg.querySelectorAll('circle.wrong')).toHaveLength(1);
    expect([...svg.querySelectorAll('circle title')].map((t) => t.textContent)).toEqual([
      'Sam: 8 min',
      'Kim: 2 min',
      'Lee: 8.3 min',
    ]);
    expect(svg.querySelector('.simulated-label')?.textContent).toBe('simulated 7.9 min');
    expect(svg.querySelector('rect.band')).not.toBeNull();
    expect(svg.getAttribute('aria-label')).toBe('3 predictions for: Period?');
  });

  it('hides the answer and the colours until it is shown', async () => {
    const svg = await render({
      question: period,
      answers: [answer('Sam', 480, true, 'p')],
      simulated: 472,
      showAnswer: false,
    });
    expect(svg.querySelector('.simulated')).toBeNull();
    expect(svg.querySelector('rect.band')).toBeNull();
    expect(svg.querySelectorAll('circle.right, circle.wrong')).toHaveLength(0);
  });

  it('puts regime predictions in rows with counts and marks the simulated regime', async () => {
    const svg = await render({
      question: regime,
      answers: [
        answer('Sam', 'spill-stall', true, 'r'),
        answer('Kim', 'cycling', false, 'r'),
        answer('Lee', 'spill-stall', true, 'r'),
      ],
      simulated: 'spill-stall',
    });
    const counts = [...svg.querySelectorAll('.count')].map((c) => c.textContent);
    expect(counts).toEqual(['1', '2', '0']);
    expect(svg.querySelector('.choice.answer .choice-label')?.textContent).toContain(
      'never starts',
    );
  });
});
