import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-client';
import { applyServerErrors, fieldMessage } from './form-errors';

describe('server errors on a form', () => {
  it('puts each detail on its field and says nothing more when all found a field', () => {
    const setError = vi.fn();
    const error = new ApiError(400, 'validation_failed', 'Check the fields.', [
      { path: 'email', message: 'is already in use' },
      { path: 'password', message: 'must be at least 10 characters' },
    ]);
    expect(applyServerErrors(error, setError, ['email', 'password'])).toBeNull();
    expect(setError).toHaveBeenCalledWith('email', { type: 'server', message: 'is already in use' }, { shouldFocus: true });
    expect(setError).toHaveBeenCalledWith('password', { type: 'server', message: 'must be at least 10 characters' }, { shouldFocus: false });
  });

  it('maps a nested path to its top-level field and keeps unknown paths for the form message', () => {
    const setError = vi.fn();
    const error = new ApiError(400, 'validation_failed', 'Check the fields.', [
      { path: 'priceBreaks.0.unitPrice', message: 'must be a decimal' },
      { path: 'token', message: 'is invalid' },
    ]);
    expect(applyServerErrors(error, setError, ['priceBreaks'])).toBe('Check the fields. token is invalid');
    expect(setError).toHaveBeenCalledTimes(1);
    expect(setError.mock.calls[0][0]).toBe('priceBreaks');
  });

  it('shows the server message when there are no field details (a wrong password)', () => {
    const error = new ApiError(401, 'unauthenticated', 'E-mail or password is wrong.');
    expect(applyServerErrors(error, vi.fn(), ['email', 'password'])).toBe('E-mail or password is wrong.');
  });

  it('speaks calmly of a database outage', () => {
    const error = new ApiError(503, 'database_unavailable', 'Database unavailable.');
    expect(applyServerErrors(error, vi.fn(), [])).toMatch(/reconnecting/i);
  });

  it('reads a schema message after the field label, and keeps a full sentence as is', () => {
    expect(fieldMessage('Email', 'must be an e-mail address')).toBe('Email must be an e-mail address');
    expect(fieldMessage('Workspace name', 'Too big: expected string to have <=120 characters')).toBe(
      'Too big: expected string to have <=120 characters',
    );
    expect(fieldMessage('Email', undefined)).toBeUndefined();
  });
});
