export default function Home() {
  return <main>Heatsplit</main>;
}
