/** Task pane (placeholder until the table editor lands): says which table is in use. */
const status = document.getElementById('status');
if (status) status.textContent = 'The built-in potential table is in use.';
export {};
