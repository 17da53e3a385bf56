import { changePasswordSchema, signInRequestSchema, signUpRequestSchema } from '@/shared/api/auth';
import { ApiError } from '@/components/api/client';
import { checkForm, errorsFrom, fieldMessage } from './form-errors';

describe('fieldMessage', () => {
  it('drops the leading field name and makes a sentence', () => {
    expect(fieldMessage('password', 'password must be at least 10 characters')).toBe(
      'Must be at least 10 characters.',
    );
    expect(fieldMessage('password', 'e-mail or password is wrong')).toBe('E-mail or password is wrong.');
    expect(fieldMessage('token', 'Invalid link.')).toBe('Invalid link.');
  });
});

describe('checkForm', () => {
  const fields = ['email', 'displayName', 'teamName'] as const;

  it('passes a valid form', () => {
    const values = { email: 'a@b.example', displayName: 'A', teamName: 'Lab' };
    expect(checkForm(signUpRequestSchema, values, fields)).toBeNull();
  });

  it('reports each bad field once, beside the field', () => {
    const values = { email: 'not-an-address', displayName: ' ', teamName: 'L' };
    const errors = checkForm(signUpRequestSchema, values, fields);
    expect(errors?.fields).toEqual({
      email: 'Not a valid address.',
      displayName: 'Required.',
      teamName: 'Needs at least 2 characters.',
    });
    expect(errors?.banner).toBeNull();
  });

  it('names a short new password beside its field', () => {
    const errors = checkForm(changePasswordSchema, { currentPassword: 'old one', newPassword: 'short' }, ['currentPassword', 'newPassword'] as const);
    expect(errors?.fields).toEqual({ newPassword: 'Password must be at least 10 characters.' });
  });

  it('puts problems of fields the form lacks into the banner', () => {
    const errors = checkForm(signInRequestSchema, { email: 'x@y.example', password: '' }, ['email'] as const);
    expect(errors?.fields).toEqual({});
    expect(errors?.banner).toBe('Required.');
  });
});

describe('errorsFrom', () => {
  it('maps API field errors to fields', () => {
    const error = new ApiError({
      status: 400,
      name: 'SignInFailed',
      message: 'E-mail or password is wrong.',
      fieldErrors: [{ field: 'password', message: 'e-mail or password is wrong' }],
    });
    expect(errorsFrom(error, ['email', 'password'] as const)).toEqual({
      fields: { password: 'E-mail or password is wrong.' },
      banner: null,
    });
  });

  it('uses the message when the API names no field (429)', () => {
    const error = new ApiError({ status: 429, name: 'TooManyRequests', message: 'Too many attempts; try again in 15 minutes.' });
    expect(errorsFrom(error, ['email'] as const)).toEqual({
      fields: {},
      banner: 'Too many attempts; try again in 15 minutes.',
    });
  });

  it('says a refused hidden field in its own words', () => {
    const error = new ApiError({
      status: 400,
      name: 'ValidationError',
      message: 'token: this reset link is invalid, used or expired: ask for a new one',
      fieldErrors: [{ field: 'token', message: 'this reset link is invalid, used or expired: ask for a new one' }],
    });
    expect(errorsFrom(error, ['password'] as const).banner).toBe(
      'This reset link is invalid, used or expired: ask for a new one.',
    );
  });

  it('keeps the summary of a conflict whose field is not on the form', () => {
    const error = new ApiError({
      status: 409,
      name: 'Conflict',
      message: 'The team needs at least one admin: make someone else admin first.',
      fieldErrors: [{ field: 'role', message: 'last admin' }],
    });
    expect(errorsFrom(error, [] as const).banner).toBe(
      'The team needs at least one admin: make someone else admin first.',
    );
  });
});
