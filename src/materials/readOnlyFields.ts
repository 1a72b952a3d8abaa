/** Classes for a disabled fieldset whose fields should read as plain text, so nobody tries to type in them. */
export const READ_ONLY_FIELDS = '[&_.field:disabled]:border-transparent [&_.field:disabled]:bg-transparent [&_select:disabled]:appearance-none';
