// Stands in for the "server-only" guard in the scale tests, which import server modules outside Next.
export {};
