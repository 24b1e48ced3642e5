// react-native-web 0.21's Animated (vendor/react-native/Animated/Animated.js) with its component wrappers
// loaded on first use. The original imports Animated.FlatList, SectionList, ScrollView and Image up front,
// which evaluates FlatList and VirtualizedList for any screen that animates a View (react-native-screens'
// Screen does, on every boot). Same object otherwise: the implementation's functions, then the six
// components. Resolved in place of the original by metro.config.js (DEVELOPERS.md, "Bundle aliases").
/* global require, exports */
'use strict';
Object.defineProperty(exports, '__esModule', { value: true });
const Platform = require('react-native-web/dist/exports/Platform').default;
const Animated = Platform.isTesting
  ? require('react-native-web/dist/vendor/react-native/Animated/AnimatedMock').default
  : require('react-native-web/dist/vendor/react-native/Animated/AnimatedImplementation').default;
const lazyAnimated = {};
const COMPONENTS = {
  FlatList: () => require('react-native-web/dist/vendor/react-native/Animated/components/AnimatedFlatList').default,
  Image: () => require('react-native-web/dist/vendor/react-native/Animated/components/AnimatedImage').default,
  ScrollView: () => require('react-native-web/dist/vendor/react-native/Animated/components/AnimatedScrollView').default,
  SectionList: () => require('react-native-web/dist/vendor/react-native/Animated/components/AnimatedSectionList').default,
  Text: () => require('react-native-web/dist/vendor/react-native/Animated/components/AnimatedText').default,
  View: () => require('react-native-web/dist/vendor/react-native/Animated/components/AnimatedView').default,
};
for (const [name, load] of Object.entries(COMPONENTS)) {
  Object.defineProperty(lazyAnimated, name, {
    enumerable: true,
    configurable: true,
    get() {
      const value = load();
      // Later reads skip the getter (and a caller may still assign over it, as on the original object).
      Object.defineProperty(lazyAnimated, name, { value, enumerable: true, configurable: true, writable: true });
      return value;
    },
  });
}
Object.assign(lazyAnimated, Animated);
exports.default = lazyAnimated;
