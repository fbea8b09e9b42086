import { ChangeDetectionStrategy, Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import type { Dimension, UnitSystem } from '../../../../shared/scenario';
import { QuantityInput } from './quantity-input';

@Component({
  imports: [QuantityInput, ReactiveFormsModule],
  template: `<tw-quantity-input
    [formControl]="control"
    label="Standpipe"
    [dimension]="dimension()"
    [system]="system()"
    [error]="error()"
  />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class Host {
  readonly control = new FormControl<number | string | null>(null);
  readonly dimension = signal<Dimension>('diameter');
  readonly system = signal<UnitSystem>('us');
  readonly error = signal<string | null>(null);
}

async function render(value: number | string | null, dimension: Dimension, system: UnitSystem) {
  const fixture = TestBed.createComponent(Host);
  const host = fixture.componentInstance;
  host.dimension.set(dimension);
  host.system.set(system);
  host.control.setValue(value);
  await fixture.whenStable();
  const root = fixture.nativeElement as HTMLElement;
  const field = root.querySelector('input');
  if (!field) throw new Error('The quantity input rendered no <input>.');
  return { fixture, host, root, field };
}

async function typeInto(
  fixture: { whenStable(): Promise<unknown> },
  field: HTMLInputElement,
  text: string,
) {
  field.value = text;
  field.dispatchEvent(new Event('input'));
  field.dispatchEvent(new Event('blur'));
  await fixture.whenStable();
}

describe('QuantityInput', () => {
  it('shows an SI diameter of 0.0254 m as 1 in for US customary readers', async () => {
    const { root, field } = await render(0.0254, 'diameter', 'us');
    expect(field.value).toBe('1');
    expect(root.querySelector('.unit')?.textContent?.trim()).toBe('in');
  });

  it('shows the same diameter as 25.4 mm once the reader switches to metric', async () => {
    const { fixture, host, root, field } = await render(0.0254, 'diameter', 'us');
    host.system.set('metric');
    await fixture.whenStable();
    expect(field.value).toBe('25.4');
    expect(root.querySelector('.unit')?.textContent?.trim()).toBe('mm');
    expect(host.control.value).toBe(0.0254);
  });

  it('stores a typed 2 in as 0.0508 m', async () => {
    const { fixture, host, field } = await render(0.0254, 'diameter', 'us');
    await typeInto(fixture, field, '2');
    expect(host.control.value).toBeCloseTo(0.0508, 12);
  });

  it('reads a number typed with another unit of the same kind', async () => {
    const { fixture, host, field } = await render(null, 'flow', 'metric');
    await typeInto(fixture, field, '300 L/h');
    expect(host.control.value).toBeCloseTo(300 / 1000 / 3600, 15);
    expect(field.value).toBe('5');
  });

  it('keeps the stored value and says why when the unit is of the wrong kind', async () => {
    const { fixture, host, root, field } = await render(0.3, 'length', 'metric');
    await typeInto(fixture, field, '2 h');
    expect(host.control.value).toBe(0.3);
    expect(root.querySelector('mat-error')?.textContent).toContain('Expected a length');
  });

  it('does not round a stored value it only shows', async () => {
    const { host } = await render(0.123456789, 'length', 'us');
    expect(host.control.value).toBe(0.123456789);
  });

  it('reads a stored string with a unit as its SI value', async () => {
    const { field } = await render('1 ft', 'length', 'us');
    expect(field.value).toBe('12');
  });

  it('shows an outside error under the field', async () => {
    const { fixture, host, root } = await render(0.3, 'length', 'metric');
    host.error.set('The standpipe must be shorter than the bed.');
    await fixture.whenStable();
    expect(root.querySelector('mat-error')?.textContent?.trim()).toBe(
      'The standpipe must be shorter than the bed.',
    );
  });

  it('converts a temperature typed in degrees Fahrenheit to Celsius', async () => {
    const { fixture, host, field } = await render(24, 'temperature', 'us');
    expect(Number(field.value)).toBeCloseTo(75.2, 6);
    await typeInto(fixture, field, '212');
    expect(host.control.value).toBeCloseTo(100, 9);
  });

  it('shows and reads a field in its own unit when one is given', async () => {
    TestBed.configureTestingModule({});
    const fixture = TestBed.createComponent(QuantityInput);
    fixture.componentRef.setInput('label', 'Simulated time');
    fixture.componentRef.setInput('dimension', 'time');
    fixture.componentRef.setInput('unit', 'h');
    const changes: (number | null)[] = [];
    fixture.componentInstance.registerOnChange((value) => changes.push(value));
    fixture.componentInstance.writeValue(21600);
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    const field = root.querySelector('input');
    if (!field) throw new Error('No input.');
    expect(field.value).toBe('6');
    expect(root.querySelector('.unit')?.textContent?.trim()).toBe('h');
    await typeInto(fixture, field, '1.5');
    expect(changes).toEqual([5400]);
  });
});
