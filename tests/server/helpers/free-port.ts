// A TCP port on the loopback interface that nothing listens on at the moment of asking (the OS picks it), for the
// tests that start servers and clusters of their own.
import net from 'node:net';

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}
