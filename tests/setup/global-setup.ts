// Placeholder: replaced by the database setup (migrations on the test cluster).
export default async function setup() {}
