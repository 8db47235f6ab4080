// The browser loads the mathjs unit reader in the background and the server at
// start; unit tests run with it installed, as the app is once loaded.
import '../../shared/schemas/unit-reader';
