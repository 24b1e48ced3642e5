import { useState } from 'react';
import { View } from 'react-native';
import { Button, HelperText, Text, TextInput } from 'react-native-paper';
import { z } from 'zod';

const SignIn = z.object({ email: z.string().email(), password: z.string().min(1) });

export default function SignInScreen() {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [error, setError] = useState('');
  const submit = () => {
    const parsed = SignIn.safeParse({ email, password });
    setError(parsed.success ? '' : 'Enter an e-mail address and a password.');
  };
  return (
    <View style={{ padding: 16, gap: 12 }}>
      <Text variant="headlineMedium">Sign in</Text>
      <TextInput testID="sign-in-email" label="E-mail" mode="outlined" value={email} onChangeText={setEmail} />
      <TextInput label="Password" mode="outlined" secureTextEntry value={password} onChangeText={setPassword} />
      <HelperText type="error" visible={Boolean(error)}>
        {error}
      </HelperText>
      <Button mode="contained" onPress={submit}>
        Sign in
      </Button>
    </View>
  );
}
