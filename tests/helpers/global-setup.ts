// Placeholder: replaced by the service start-up (PostgreSQL, mail catcher, search stand-in).
export default function setup(): void {}
