export { DEMO_CLUB, DEMO_PASSWORD, DEMO_PEOPLE, DEMO_TEAMS } from './demo-data';
export { demoSeeded, seedDemo } from './seed-demo';
