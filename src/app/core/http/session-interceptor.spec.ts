import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { sessionInterceptor } from './session-interceptor';

function setUp() {
  TestBed.configureTestingModule({
    providers: [
      provideRouter([]),
      provideHttpClient(withInterceptors([sessionInterceptor])),
      provideHttpClientTesting(),
    ],
  });
  const router = TestBed.inject(Router);
  const navigate = vi.spyOn(router, 'navigateByUrl').mockResolvedValue(true);
  return {
    http: TestBed.inject(HttpClient),
    backend: TestBed.inject(HttpTestingController),
    navigate,
  };
}

describe('sessionInterceptor', () => {
  it('sends API calls with credentials and leaves other calls alone', () => {
    const { http, backend } = setUp();
    http.get('/api/systems').subscribe();
    http.get('/favicon.svg').subscribe();
    expect(backend.expectOne('/api/systems').request.withCredentials).toBe(true);
    expect(backend.expectOne('/favicon.svg').request.withCredentials).toBe(false);
  });

  it('turns a 401 from an API call into a sign-in redirect and still fails the call', async () => {
    const { http, backend, navigate } = setUp();
    const call = firstValueFrom(http.get('/api/systems'));
    backend.expectOne('/api/systems').flush(null, { status: 401, statusText: 'Unauthorized' });
    await expect(call).rejects.toMatchObject({ status: 401 });
    expect(navigate).toHaveBeenCalledTimes(1);
    expect(String(navigate.mock.calls[0]?.[0])).toBe('/sign-in');
  });

  it('treats a 401 from "who am I" and from login as answers, not redirects', async () => {
    const { http, backend, navigate } = setUp();
    const me = firstValueFrom(http.get('/api/auth/me'));
    const login = firstValueFrom(http.post('/api/auth/login', {}));
    backend.expectOne('/api/auth/me').flush(null, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/auth/login').flush(null, { status: 401, statusText: 'Unauthorized' });
    await expect(me).rejects.toMatchObject({ status: 401 });
    await expect(login).rejects.toMatchObject({ status: 401 });
    expect(navigate).not.toHaveBeenCalled();
  });

  it('passes other errors through without navigating', async () => {
    const { http, backend, navigate } = setUp();
    const call = firstValueFrom(http.get('/api/systems/42'));
    backend.expectOne('/api/systems/42').flush(null, { status: 404, statusText: 'Not Found' });
    await expect(call).rejects.toMatchObject({ status: 404 });
    expect(navigate).not.toHaveBeenCalled();
  });
});
