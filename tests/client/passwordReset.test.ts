// @vitest-environment happy-dom
/** Forgot-password and reset pages: the neutral answer is shown; the repeat must match; success returns to sign-in with a notice. */
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { createMemoryHistory, createRouter } from 'vue-router';
import ForgotPasswordPage from '@/pages/signin/ForgotPasswordPage.vue';
import ResetPasswordPage from '@/pages/signin/ResetPasswordPage.vue';
import { ApiError } from '@/api/http';
import * as authApi from '@/api/auth';

vi.mock('@/api/auth', () => ({
  requestPasswordReset: vi.fn(), fetchPasswordReset: vi.fn(), resetPassword: vi.fn(),
  fetchMe: vi.fn(async () => { throw new Error('signed out'); }),
}));

const TOKEN = 'abcdefghijklmnopqrstuvwxyz012345';

async function open(page: object, path: string) {
  const stub = { render: () => null };
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/signin', name: 'signin', component: stub },
      { path: '/forgot', name: 'forgot', component: page },
      { path: '/reset/:token', name: 'reset', component: page },
    ],
  });
  await router.push(path);
  const w = mount(page, { global: { plugins: [router] } });
  await flushPromises();
  return { w, router };
}

beforeEach(() => {
  setActivePinia(createPinia());
  vi.clearAllMocks();
});

describe('forgot password page', () => {
  it('sends the address and shows the server\'s neutral answer', async () => {
    vi.mocked(authApi.requestPasswordReset).mockResolvedValue({ message: 'If an account uses this address, a link is on its way.' });
    const { w } = await open(ForgotPasswordPage, '/forgot?email=kit@larkspur.example');
    expect((w.find('[data-test="forgot-email"] input').element as HTMLInputElement).value).toBe('kit@larkspur.example');
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(authApi.requestPasswordReset).toHaveBeenCalledWith('kit@larkspur.example');
    expect(w.find('[data-test="forgot-sent"]').text()).toContain('If an account uses this address');
  });
});

describe('reset password page', () => {
  it('refuses a repeat that differs, then sets the password and returns to sign-in with a notice', async () => {
    vi.mocked(authApi.fetchPasswordReset).mockResolvedValue({ email: 'kit@larkspur.example' });
    vi.mocked(authApi.resetPassword).mockResolvedValue();
    const { w, router } = await open(ResetPasswordPage, `/reset/${TOKEN}`);
    expect(authApi.fetchPasswordReset).toHaveBeenCalledWith(TOKEN);
    expect(w.text()).toContain('kit@larkspur.example');
    await w.find('[data-test="reset-password"] input').setValue('a-new-long-password');
    await w.find('[data-test="reset-repeat"] input').setValue('a-new-long-passwort');
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(w.text()).toContain('the two entries differ');
    expect(authApi.resetPassword).not.toHaveBeenCalled();

    await w.find('[data-test="reset-repeat"] input').setValue('a-new-long-password');
    await w.find('form').trigger('submit');
    await flushPromises();
    expect(authApi.resetPassword).toHaveBeenCalledWith(TOKEN, 'a-new-long-password');
    expect(router.currentRoute.value.fullPath).toBe('/signin?reset=done');
  });

  it('explains an unknown, used or expired link', async () => {
    vi.mocked(authApi.fetchPasswordReset).mockRejectedValue(new ApiError(404, 'not_found', 'gone'));
    const { w } = await open(ResetPasswordPage, `/reset/${TOKEN}`);
    expect(w.find('[data-test="reset-invalid"]').text()).toContain('works once, for one hour');
    expect(w.find('form').exists()).toBe(false);
  });
});
